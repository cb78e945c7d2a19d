namespace CellCheck.Core.Plots;

/// <summary>Vertical rules at X[i] across the panel, each with a label for the stretch that starts there (block boundaries).</summary>
public sealed record RuleSeries(SeriesRole Role, IReadOnlyList<double> X, IReadOnlyList<string> Labels) : Series(Role);
