namespace CellCheck.Core.Plots;

/// <summary>One legend entry: the symbol and what it means.</summary>
public sealed record LegendItem(LegendKey Key, string Text);
