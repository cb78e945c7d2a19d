namespace CellCheck.Core.Plots;

/// <summary>The line y = Intercept + Slope · x across the whole panel (clipped to it).</summary>
public sealed record StraightLine(SeriesRole Role, double Intercept, double Slope) : Series(Role);
