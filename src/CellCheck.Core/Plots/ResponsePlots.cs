using CellCheck.Core.Analysis;

namespace CellCheck.Core.Plots;

/// <summary>Builds the plot models of every response of a check report.</summary>
public static class ResponsePlots
{
    /// <summary>The two pictures of one response.</summary>
    public static ResponsePictures Build(DesignSummary design, ResponseReport report, PlotOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(report);
        options ??= PlotOptions.Default;
        // the per-row columns the pictures read, built here one after another (each is built on first use), so that
        // the two pictures and their panels can be made side by side
        var rows = report.Rows;
        _ = (rows.Lines, rows.Cells, rows.Fitted, rows.Studentized, rows.RunOrder, rows.BlockCodes);
        PlotModel cells = null!;
        PlotModel pooled = null!;
        Parallel.Invoke(() => cells = CellGridPlot.Build(design, report, options), () => pooled = PooledPlot.Build(design, report, options));
        return new ResponsePictures(report.Response, cells, pooled);
    }

    /// <summary>The pictures of every response, in report order.</summary>
    public static IReadOnlyList<ResponsePictures> Build(CheckReport report, PlotOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(report);
        return report.Responses.Select(r => Build(report.Design, r, options)).ToArray();
    }
}
