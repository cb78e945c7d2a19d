using System.Buffers.Binary;
using System.Text;
using System.Xml.Linq;
using CellCheck.Core.Plots;
using CellCheck.IO.Plots;
using SkiaSharp;

namespace CellCheck.IO.Tests.Plots;

/// <summary>Render smoke tests: the files exist, have the expected size, are not blank, are reproducible; SVG is XML.</summary>
public sealed class RenderTests
{
    private const string Data = "a,b,y\n1,p,5.1\n1,p,4.8\n1,p,5.3\n1,p,4.9\n1,p,5.0\n1,q,6.0\n1,q,6.3\n1,q,5.8\n2,p,4.0\n2,p,4.4\n2,p,4.1\n2,q,7.1\n2,q,7.3\n2,q,7.0\n2,q,7.2\n2,q,9.9\n";

    private static IReadOnlyList<ResponsePictures> Pictures(TempDesign t)
    {
        var run = CheckRun.Run(t.DesignPath);
        Assert.True(run.Ok, string.Join("; ", run.Problems.Select(p => p.What)));
        return ResponsePlots.Build(run.Value!.Report);
    }

    private static byte[] Png(PlotModel model, int dpi)
    {
        using var stream = new MemoryStream();
        PlotRenderer.WritePng(model, stream, dpi);
        return stream.ToArray();
    }

    [Theory]
    [InlineData(72)]
    [InlineData(150)]
    [InlineData(300)]
    public void A_png_has_the_size_of_its_layout_at_the_resolution_and_records_the_resolution(int dpi)
    {
        using var t = new TempDesign(Data);
        foreach (var model in Pictures(t).SelectMany(p => (PlotModel[])[p.Cells, p.Pooled]))
        {
            var bytes = Png(model, dpi);
            using var bitmap = SKBitmap.Decode(bytes);
            var (w, h) = PlotRenderer.SizeInPoints(model);
            Assert.Equal(((int)Math.Ceiling(w * dpi / 72f), (int)Math.Ceiling(h * dpi / 72f)), (bitmap.Width, bitmap.Height));
            Assert.Equal(PlotRenderer.SizeInPixels(model, dpi), (bitmap.Width, bitmap.Height));
            var phys = IndexOf(bytes, "pHYs"u8);
            Assert.True(phys > 0);
            Assert.Equal((uint)Math.Round(dpi / 0.0254), BinaryPrimitives.ReadUInt32BigEndian(bytes.AsSpan(phys + 4)));
        }
    }

    [Fact]
    public void A_png_is_not_blank_and_shows_the_data_colour()
    {
        using var t = new TempDesign(Data);
        using var bitmap = SKBitmap.Decode(Png(Pictures(t)[0].Cells, 100));
        var white = 0;
        var colours = new HashSet<SKColor>();
        var blue = 0;
        for (var y = 0; y < bitmap.Height; y += 2)
        {
            for (var x = 0; x < bitmap.Width; x += 2)
            {
                var c = bitmap.GetPixel(x, y);
                white += c == SKColors.White ? 1 : 0;
                colours.Add(c);
                blue += c == new SKColor(0x00, 0x72, 0xB2) ? 1 : 0;
            }
        }

        var total = ((bitmap.Width + 1) / 2) * ((bitmap.Height + 1) / 2);
        Assert.InRange(white / (double)total, 0.3, 0.98);
        Assert.True(colours.Count > 20, colours.Count.ToString(System.Globalization.CultureInfo.InvariantCulture));
        Assert.True(blue > 10, "no pixel in the data colour");
    }

    [Fact]
    public void The_same_model_gives_byte_identical_pngs_and_svgs()
    {
        using var t = new TempDesign(Data);
        var first = Pictures(t)[0];
        var second = Pictures(t)[0];
        Assert.Equal(Png(first.Cells, 150), Png(second.Cells, 150));
        Assert.Equal(Png(first.Pooled, 150), Png(second.Pooled, 150));
        using var a = new MemoryStream();
        using var b = new MemoryStream();
        PlotRenderer.WriteSvg(first.Pooled, a);
        PlotRenderer.WriteSvg(second.Pooled, b);
        Assert.Equal(a.ToArray(), b.ToArray());
    }

    [Fact]
    public void An_svg_parses_as_xml_with_its_size_title_and_text_as_outlines()
    {
        using var t = new TempDesign(Data);
        var model = Pictures(t)[0].Cells;
        using var stream = new MemoryStream();
        PlotRenderer.WriteSvg(model, stream);
        var doc = XDocument.Parse(Encoding.UTF8.GetString(stream.ToArray()));
        XNamespace svg = "http://www.w3.org/2000/svg";
        Assert.Equal(svg + "svg", doc.Root!.Name);
        var (w, _) = PlotRenderer.SizeInPoints(model);
        Assert.Equal(w * 96f / 72f, float.Parse(doc.Root.Attribute("width")!.Value, System.Globalization.CultureInfo.InvariantCulture), 0.5f);
        Assert.Equal(model.Title, doc.Root.Element(svg + "title")!.Value);
        Assert.Empty(doc.Descendants(svg + "text"));
        Assert.True(doc.Descendants(svg + "path").Count() > 50);
    }

    [Fact]
    public void Text_is_set_in_the_embedded_font()
    {
        Assert.Equal("DejaVu Sans", PlotFonts.Regular.FamilyName);
        Assert.Equal("DejaVu Sans", PlotFonts.Bold.FamilyName);
        Assert.True(PlotFonts.Bold.IsBold);
    }

    [Fact]
    public void Many_cells_render_as_a_wrapped_grid_of_the_chosen_cells()
    {
        var rows = new StringBuilder("a,b,y\n");
        for (var a = 0; a < 10; a++)
        {
            for (var b = 0; b < 6; b++)
            {
                for (var k = 0; k < 3; k++)
                {
                    rows.Append(System.Globalization.CultureInfo.InvariantCulture, $"a{a},b{b},{(a * 0.1) + b + (k * 0.37) + ((a * b * k) % 5 * 0.11)}\n");
                }
            }
        }

        using var t = new TempDesign(rows.ToString());
        var model = Pictures(t)[0].Cells;
        Assert.Equal(48, model.Panels.Count);
        Assert.Contains(model.Notes, n => n.Contains("12 cells are not shown", StringComparison.Ordinal));
        using var bitmap = SKBitmap.Decode(Png(model, 72));
        Assert.Equal(PlotRenderer.SizeInPixels(model, 72), (bitmap.Width, bitmap.Height));
    }

    [Fact]
    public void Picture_files_are_named_after_the_response_made_file_safe_and_never_overwrite_an_input()
    {
        using var t = new TempDesign(Data, "data: data.csv\nfactors: [a, b]\nresponses:\n  - column: y\n    name: yield (t/ha)\n");
        var run = CheckRun.Run(t.DesignPath).Value!;
        var folder = Path.Combine(t.Folder, "pictures");
        var (written, problem) = PictureFiles.Write(run.Report, folder, [t.DesignPath, t.DataPath], 72);
        Assert.Null(problem);
        Assert.Equal(["yield__t_ha_-cells.png", "yield__t_ha_-cells.svg", "yield__t_ha_-pooled.png", "yield__t_ha_-pooled.svg"],
            written.Select(Path.GetFileName));
        Assert.All(written, f => Assert.True(new FileInfo(f).Length > 1000, f));
        Assert.Empty(Directory.GetFiles(folder, "*.tmp"));

        var (_, refused) = PictureFiles.Write(run.Report, folder, [Path.Combine(folder, "yield__t_ha_-cells.png")], 72);
        Assert.Equal(ProblemCodes.OutputIsInput, refused!.Code);
    }

    [Theory]
    [InlineData("adhesion", "adhesion")]
    [InlineData("yield (t/ha)", "yield__t_ha_")]
    [InlineData("../x", "_x")]
    [InlineData("...", "response")]
    [InlineData("Härte", "H_rte")]
    public void Response_names_become_safe_file_names(string name, string expected) => Assert.Equal(expected, FileSafeName.Of(name));

    private static int IndexOf(byte[] bytes, ReadOnlySpan<byte> pattern) => bytes.AsSpan().IndexOf(pattern);
}
