namespace CellCheck.Core.Plots;

/// <summary>Points at (X[i], Y[i]), optionally each with a short label (null for none).</summary>
public sealed record PointSeries(SeriesRole Role, IReadOnlyList<double> X, IReadOnlyList<double> Y) : Series(Role)
{
    /// <summary>One label per point (null entries for unlabelled points), or null.</summary>
    public IReadOnlyList<string?>? Labels { get; init; }
}
