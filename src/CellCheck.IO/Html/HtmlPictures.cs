using System.Text;
using CellCheck.Core.Analysis;
using CellCheck.Core.Plots;
using CellCheck.IO.Plots;

namespace CellCheck.IO.Html;

/// <summary>
/// The pictures of every response as inline SVG for the HTML page (XML declaration and namespace URIs removed), with captions; when a
/// transformation was applied, the transformed response's pictures follow.
/// </summary>
public static class HtmlPictures
{
    public static IReadOnlyDictionary<string, IReadOnlyList<(string Title, string Svg)>> For(CheckReport report) =>
        For(report, ResponsePlots.Build(report ?? throw new ArgumentNullException(nameof(report))));

    /// <summary>As <see cref="For(CheckReport)"/>, with the responses' pictures already built (<paramref name="pictures"/>,
    /// in report order, as <see cref="ResponsePlots.Build(CheckReport, PlotOptions?)"/> makes them): only the pictures
    /// after a transformation are built here.</summary>
    public static IReadOnlyDictionary<string, IReadOnlyList<(string Title, string Svg)>> For(CheckReport report, IReadOnlyList<ResponsePictures> pictures)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(pictures);
        if (pictures.Count != report.Responses.Count)
        {
            throw new ArgumentException("one set of pictures per response, in report order", nameof(pictures));
        }

        var result = new Dictionary<string, IReadOnlyList<(string, string)>>(StringComparer.Ordinal);
        for (var r = 0; r < report.Responses.Count; r++)
        {
            var response = report.Responses[r];
            var list = new List<(string, string)>();
            Add(list, pictures[r], string.Empty);
            if (response.Remedy is { After: { } after, Applied: { } applied })
            {
                Add(list, ResponsePlots.Build(report.Design, after), " after " + applied.Name);
            }

            result[response.Response] = list;
        }

        return result;
    }

    /// <summary>Adds the two pictures, drawn side by side.</summary>
    private static void Add(List<(string, string)> list, ResponsePictures pictures, string suffix)
    {
        string cells = null!;
        string pooled = null!;
        Parallel.Invoke(() => cells = Svg(pictures.Cells), () => pooled = Svg(pictures.Pooled));
        list.Add(("Residuals within each cell of " + pictures.Response + suffix + " (normal QQ plots or dot strips on a shared axis)", cells));
        list.Add(("Pooled residuals of " + pictures.Response + suffix + ": QQ plot, against fitted values, against run order, spread against level", pooled));
    }

    private static string Svg(PlotModel model)
    {
        using var stream = new MemoryStream();
        PlotRenderer.WriteSvg(model, stream);
        var text = Encoding.UTF8.GetString(stream.ToArray());
        var start = text.IndexOf("<svg", StringComparison.Ordinal);
        text = start > 0 ? text[start..] : text;

        // inside HTML the parser puts <svg> in the SVG namespace itself; the namespace URIs are identifiers, not
        // resources, and are dropped so the page holds no address at all
        return text.Replace(" xmlns=\"http://www.w3.org/2000/svg\"", string.Empty, StringComparison.Ordinal)
            .Replace(" xmlns:xlink=\"http://www.w3.org/1999/xlink\"", string.Empty, StringComparison.Ordinal);
    }
}
