using SkiaSharp;

namespace CellCheck.IO.Plots;

/// <summary>
/// The pictures' typefaces, DejaVu Sans regular and bold, loaded from this assembly's embedded resources (never from the
/// machine), so text is shaped and rasterised the same on every machine. Fonts are unhinted with subpixel positioning.
/// </summary>
internal static class PlotFonts
{
    private static readonly Lazy<SKTypeface> RegularFace = new(() => Load("CellCheck.IO.Fonts.DejaVuSans.ttf"));
    private static readonly Lazy<SKTypeface> BoldFace = new(() => Load("CellCheck.IO.Fonts.DejaVuSans-Bold.ttf"));

    public static SKTypeface Regular => RegularFace.Value;

    public static SKTypeface Bold => BoldFace.Value;

    /// <summary>A font of the given size in points (1 unit of the layout).</summary>
    public static SKFont Font(float size, bool bold = false) => new(bold ? Bold : Regular, size)
    {
        Edging = SKFontEdging.Antialias,
        Hinting = SKFontHinting.None,
        Subpixel = true,
        LinearMetrics = true,
    };

    private static SKTypeface Load(string name)
    {
        using var stream = typeof(PlotFonts).Assembly.GetManifestResourceStream(name)
            ?? throw new InvalidOperationException("embedded font " + name + " is missing");
        var memory = new MemoryStream();
        stream.CopyTo(memory);
        memory.Position = 0;
        return SKTypeface.FromStream(memory) ?? throw new InvalidOperationException("embedded font " + name + " cannot be read");
    }
}
