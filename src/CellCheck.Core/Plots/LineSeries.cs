namespace CellCheck.Core.Plots;

/// <summary>A polyline through (X[i], Y[i]) in the given order.</summary>
public sealed record LineSeries(SeriesRole Role, IReadOnlyList<double> X, IReadOnlyList<double> Y) : Series(Role);
