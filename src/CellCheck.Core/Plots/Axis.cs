namespace CellCheck.Core.Plots;

/// <summary>
/// An axis: its title, the data range it shows (already padded) and its ticks. Values on a log axis are given as
/// log10 of the data and the tick labels name the data values.
/// </summary>
public sealed record Axis(string Label, double Min, double Max, IReadOnlyList<Tick> Ticks);
