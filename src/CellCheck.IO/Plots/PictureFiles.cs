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

            // the response's four files drawn side by side into memory (each alone), then written in order
            (string Path, PlotModel Model, bool Png)[] files =
            [
                (Path.Combine(folder, name + "-cells.png"), pictures.Cells, true),
                (Path.Combine(folder, name + "-cells.svg"), pictures.Cells, false),
                (Path.Combine(folder, name + "-pooled.png"), pictures.Pooled, true),
                (Path.Combine(folder, name + "-pooled.svg"), pictures.Pooled, false),
            ];
            var drawn = new MemoryStream[files.Length];
            Parallel.For(0, files.Length, k =>
            {
                drawn[k] = new MemoryStream();
                if (files[k].Png)
                {
                    PlotRenderer.WritePng(files[k].Model, drawn[k], dpi);
                }
                else
                {
                    PlotRenderer.WriteSvg(files[k].Model, drawn[k]);
                }
            });
            for (var k = 0; k < files.Length; k++)
            {
                var bytes = drawn[k];
                var problem = AtomicFile.Write(files[k].Path, inputList, s => s.Write(bytes.GetBuffer(), 0, (int)bytes.Length));
                if (problem is not null)
                {
                    return (written, problem);
                }

                written.Add(files[k].Path);
            }
        }

        return (written, null);
    }
}
