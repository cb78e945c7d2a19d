using CellCheck.Core.Analysis;
using CellCheck.Core.Plots;
using CellCheck.Core.Problems;
using CellCheck.IO.Reports;

namespace CellCheck.IO.Plots;

/// <summary>
/// Writes the pictures of a check report into a folder: for each response <c>NAME-cells.png</c>, <c>NAME-cells.svg</c>,
/// <c>NAME-pooled.png</c> and <c>NAME-pooled.svg</c>, NAME being the response name made file-safe (with -2, -3, … when
/// two responses come out the same). Each file is written atomically and never over an input.
/// </summary>
public static class PictureFiles
{
    /// <summary>Writes the files; returns the paths written, or the first problem.</summary>
    public static (IReadOnlyList<string> Written, Problem? Problem) Write(CheckReport report, string folder, IEnumerable<string> inputs, int dpi = PlotRenderer.DefaultDpi, PlotOptions? options = null) =>
        Write(ResponsePlots.Build(report ?? throw new ArgumentNullException(nameof(report)), options), folder, inputs, dpi);

    /// <summary>Writes the files of pictures already built (one set per response, in report order).</summary>
    public static (IReadOnlyList<string> Written, Problem? Problem) Write(IReadOnlyList<ResponsePictures> responses, string folder, IEnumerable<string> inputs, int dpi = PlotRenderer.DefaultDpi)
    {
        ArgumentNullException.ThrowIfNull(responses);
        ArgumentNullException.ThrowIfNull(folder);
        var inputList = inputs.ToArray();
        var written = new List<string>();
        var used = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        foreach (var pictures in responses)
        {
            var stem = FileSafeName.Of(pictures.Response);
            var name = stem;
            for (var k = 2; !used.Add(name); k++)
            {
                name = stem + "-" + k.ToString(System.Globalization.CultureInfo.InvariantCulture);
            }

            foreach (var (suffix, model) in (ReadOnlySpan<(string, PlotModel)>)[("cells", pictures.Cells), ("pooled", pictures.Pooled)])
            {
                var png = Path.Combine(folder, name + "-" + suffix + ".png");
                var problem = AtomicFile.Write(png, inputList, s => PlotRenderer.WritePng(model, s, dpi));
                if (problem is not null)
                {
                    return (written, problem);
                }

                written.Add(png);
                var svg = Path.Combine(folder, name + "-" + suffix + ".svg");
                problem = AtomicFile.Write(svg, inputList, s => PlotRenderer.WriteSvg(model, s));
                if (problem is not null)
                {
                    return (written, problem);
                }

                written.Add(svg);
            }
        }

        return (written, null);
    }
}
