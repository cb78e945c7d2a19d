using SkiaSharp;

namespace CellCheck.IO.Plots;

/// <summary>A line of text at a baseline position; vertical text reads bottom to top, centred on (X, Y).</summary>
internal sealed record PlacedText(string Text, float X, float Y, SKFont Font, SKColor Color, SKTextAlign Align, bool Vertical = false);
