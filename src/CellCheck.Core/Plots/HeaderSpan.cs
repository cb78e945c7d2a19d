namespace CellCheck.Core.Plots;

/// <summary>A level label spanning <see cref="Columns"/> adjacent grid columns.</summary>
public sealed record HeaderSpan(string Label, int Columns);
