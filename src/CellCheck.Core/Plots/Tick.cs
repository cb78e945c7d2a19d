namespace CellCheck.Core.Plots;

/// <summary>A tick at <see cref="Value"/> (axis units) with its printed label.</summary>
public sealed record Tick(double Value, string Label);
