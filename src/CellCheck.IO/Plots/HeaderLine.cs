using SkiaSharp;

namespace CellCheck.IO.Plots;

/// <summary>One line of a panel's header strip and the font it is set in.</summary>
internal sealed record HeaderLine(string Text, SKFont Font, bool Strong);
