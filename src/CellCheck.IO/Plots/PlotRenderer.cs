using System.Globalization;
using System.Security;
using System.Text;
using System.Text.RegularExpressions;
using CellCheck.Core.Plots;
using SkiaSharp;

namespace CellCheck.IO.Plots;

/// <summary>
/// Renders a <see cref="PlotModel"/> to PNG (raster at a chosen resolution, default 150 dpi, with the resolution
/// recorded in the file) or SVG (vector, text as outlines of the embedded font, with the title and subtitle as the
/// SVG's title and description). The same model gives byte-identical files.
/// </summary>
public static partial class PlotRenderer
{
    /// <summary>Default PNG resolution.</summary>
    public const int DefaultDpi = 150;

    /// <summary>Lowest and highest resolution accepted.</summary>
    public const int MinDpi = 36;

    public const int MaxDpi = 600;

    /// <summary>CSS pixels per point, for the SVG's size.</summary>
    private const float SvgScale = 96f / 72f;

    /// <summary>The picture's size in points.</summary>
    public static (float Width, float Height) SizeInPoints(PlotModel model)
    {
        using var fonts = new PlotFontSet();
        var layout = new PlotLayout(model, fonts);
        return (layout.Width, layout.Height);
    }

    /// <summary>The PNG's size in pixels at <paramref name="dpi"/>.</summary>
    public static (int Width, int Height) SizeInPixels(PlotModel model, int dpi = DefaultDpi)
    {
        var (w, h) = SizeInPoints(model);
        return Pixels(w, h, dpi);
    }

    public static void WritePng(PlotModel model, Stream output, int dpi = DefaultDpi)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(output);
        ArgumentOutOfRangeException.ThrowIfLessThan(dpi, MinDpi);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(dpi, MaxDpi);
        using var fonts = new PlotFontSet();
        var layout = new PlotLayout(model, fonts);
        var (width, height) = Pixels(layout.Width, layout.Height, dpi);
        var info = new SKImageInfo(width, height, SKColorType.Rgba8888, SKAlphaType.Premul);
        using var surface = SKSurface.Create(info) ?? throw new InvalidOperationException("cannot create a " + width + " x " + height + " raster surface");
        var canvas = surface.Canvas;
        canvas.Scale(dpi / 72f);
        new PlotPainter(layout, textAsPaths: false).Paint(canvas);
        canvas.Flush();
        using var image = surface.Snapshot();
        using var data = image.Encode(SKEncodedImageFormat.Png, 100) ?? throw new InvalidOperationException("PNG encoding failed");
        var bytes = PngDensity.WithDpi(data.ToArray(), dpi);
        output.Write(bytes);
    }

    public static void WriteSvg(PlotModel model, Stream output)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(output);
        using var fonts = new PlotFontSet();
        var layout = new PlotLayout(model, fonts);
        using var buffer = new MemoryStream();
        using (var svg = SKSvgCanvas.Create(new SKRect(0, 0, layout.Width * SvgScale, layout.Height * SvgScale), buffer))
        {
            svg.Scale(SvgScale);
            new PlotPainter(layout, textAsPaths: true).Paint(svg);
        }

        var text = Encoding.UTF8.GetString(buffer.ToArray());
        output.Write(Encoding.UTF8.GetBytes(WithTitle(Renumbered(text), model)));
    }

    /// <summary>Skia numbers clip paths from a counter that lives as long as the process; renumber them in order of
    /// appearance so the same picture always gives the same file.</summary>
    private static string Renumbered(string svg)
    {
        var ids = new Dictionary<string, string>(StringComparer.Ordinal);
        return IdPattern().Replace(svg, m =>
        {
            var old = m.Groups[2].Value;
            if (!ids.TryGetValue(old, out var fresh))
            {
                fresh = "clip" + ids.Count.ToString(CultureInfo.InvariantCulture);
                ids[old] = fresh;
            }

            return m.Groups[1].Value + fresh;
        });
    }

    [GeneratedRegex(@"(id=""|url\(#)([A-Za-z]+_[0-9A-Za-z]+)")]
    private static partial Regex IdPattern();

    /// <summary>Adds &lt;title&gt; and &lt;desc&gt; after the root element's start tag, so the outlined text stays findable.</summary>
    private static string WithTitle(string svg, PlotModel model)
    {
        var root = svg.IndexOf("<svg", StringComparison.Ordinal);
        var end = root < 0 ? -1 : svg.IndexOf('>', root);
        if (end < 0)
        {
            return svg;
        }

        var insert = "\n<title>" + SecurityElement.Escape(model.Title) + "</title>\n<desc>"
            + SecurityElement.Escape(string.Join(" ", model.Subtitle.Concat(model.Notes))) + "</desc>";
        return svg[..(end + 1)] + insert + svg[(end + 1)..];
    }

    private static (int Width, int Height) Pixels(float width, float height, int dpi) =>
        ((int)Math.Ceiling(width * dpi / 72f), (int)Math.Ceiling(height * dpi / 72f));
}
