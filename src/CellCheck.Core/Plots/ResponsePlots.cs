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
        return new ResponsePictures(report.Response, CellGridPlot.Build(design, report, options), PooledPlot.Build(design, report, options));
    }

    /// <summary>The pictures of every response, in report order.</summary>
    public static IReadOnlyList<ResponsePictures> Build(CheckReport report, PlotOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(report);
        return report.Responses.Select(r => Build(report.Design, r, options)).ToArray();
    }
}
