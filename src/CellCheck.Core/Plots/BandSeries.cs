namespace CellCheck.Core.Plots;

/// <summary>A filled band between Lower[i] and Upper[i] at X[i] (a pointwise envelope).</summary>
public sealed record BandSeries(SeriesRole Role, IReadOnlyList<double> X, IReadOnlyList<double> Lower, IReadOnlyList<double> Upper) : Series(Role);
