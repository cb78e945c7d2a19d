using SkiaSharp;

namespace CellCheck.IO.Plots;

/// <summary>
/// The pictures' colours. Data are blue and what a check singled out is vermillion: a pair that stays distinct under
/// every common colour-vision deficiency (both are from the set of Okabe &amp; Ito 2008, "Color Universal Design"), and
/// is never the only cue (flagged panels also get a thick frame and a warning symbol, singled-out points a diamond and
/// a label). Fitted lines are bluish green; guides, grid and text are neutral greys.
/// </summary>
internal static class PlotPalette
{
    public static readonly SKColor Background = SKColors.White;
    public static readonly SKColor Ink = new(0x1F, 0x23, 0x28);
    public static readonly SKColor Secondary = new(0x55, 0x5D, 0x66);
    public static readonly SKColor Faint = new(0x8A, 0x92, 0x9A);
    public static readonly SKColor Grid = new(0xE7, 0xEA, 0xEE);
    public static readonly SKColor Frame = new(0xA9, 0xB1, 0xBA);
    public static readonly SKColor Strip = new(0xE4, 0xEC, 0xF4);
    public static readonly SKColor Points = new(0x00, 0x72, 0xB2);
    public static readonly SKColor Envelope = new(0xCC, 0xE2, 0xF2);
    public static readonly SKColor EnvelopeEdge = new(0x9F, 0xC6, 0xE4);
    public static readonly SKColor Reference = new(0x3D, 0x44, 0x4C);
    public static readonly SKColor Path = new(0xA6, 0xC8, 0xE2);
    public static readonly SKColor Fit = new(0x00, 0x9E, 0x73);
    public static readonly SKColor Alert = new(0xD5, 0x5E, 0x00);
    public static readonly SKColor Hatch = new(0xE3, 0xE6, 0xEA);
}
