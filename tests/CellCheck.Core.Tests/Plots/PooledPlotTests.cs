using CellCheck.Core.Plots;

namespace CellCheck.Core.Tests.Plots;

public sealed class PooledPlotTests
{
    [Fact]
    public void The_pooled_picture_has_a_qq_plot_of_the_studentized_residuals_at_blom_positions()
    {
        var (design, report) = PlotData.Analyze(PlotData.Mixed());
        var model = PooledPlot.Build(design, report, PlotOptions.Default);
        Assert.Equal((2, 2), (model.Grid.Rows, model.Grid.Columns));
        var qq = model.Panels[0];
        var xs = qq.Series.OfType<PointSeries>().SelectMany(s => s.X).Order().ToArray();
        var finite = report.Rows.Studentized.Where(double.IsFinite).ToArray();
        Assert.Equal(NormalScores.Blom(finite.Length), xs);
        Assert.Single(qq.Series.OfType<BandSeries>());
        Assert.Contains(qq.Series, s => s is StraightLine { Role: SeriesRole.Reference });
    }

    [Fact]
    public void Without_a_run_order_the_run_order_panel_says_how_to_declare_one()
    {
        var (design, report) = PlotData.Analyze(PlotData.Mixed());
        var panel = PooledPlot.Build(design, report, PlotOptions.Default).Panels[2];
        Assert.Empty(panel.Series);
        Assert.Contains("run_order:", panel.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Blocks_run_one_after_another_get_boundaries_labelled_with_their_levels()
    {
        var rows = PlotData.Mixed().Where(r => r.Item1 != "9").ToArray();
        var blocks = rows.Select((_, i) => i < rows.Length / 2 ? "day1" : "day2").ToArray();
        var order = rows.Select((_, i) => (double)(i + 1)).ToArray();
        var (design, report) = PlotData.Analyze(rows, blocks, order);
        var panel = PooledPlot.Build(design, report, PlotOptions.Default).Panels[2];
        var rules = panel.Series.OfType<RuleSeries>().Single();
        Assert.Equal(["block day1", "block day2"], rules.Labels);
        Assert.Equal((rows.Length / 2) + 0.5, Assert.Single(rules.X));
        Assert.Contains(panel.Series, s => s is LineSeries { Role: SeriesRole.Path });
        Assert.Equal("run order (run)", panel.X.Label);
    }

    [Fact]
    public void Interleaved_blocks_get_no_boundaries_and_a_note()
    {
        var rows = PlotData.Mixed().Where(r => r.Item1 != "9").ToArray();
        var blocks = rows.Select((_, i) => i % 2 == 0 ? "day1" : "day2").ToArray();
        var order = rows.Select((_, i) => (double)(i + 1)).ToArray();
        var (design, report) = PlotData.Analyze(rows, blocks, order);
        var model = PooledPlot.Build(design, report, PlotOptions.Default);
        Assert.DoesNotContain(model.Panels[2].Series, s => s is RuleSeries);
        Assert.Contains(model.Notes, n => n.Contains("interleaved", StringComparison.Ordinal));
    }

    [Fact]
    public void Spread_against_level_plots_log_sd_against_log_mean_with_the_least_squares_slope()
    {
        var (design, report) = PlotData.Analyze(PlotData.Mixed());
        var panel = PooledPlot.Build(design, report, PlotOptions.Default).Panels[3];
        var points = panel.Series.OfType<PointSeries>().Single();
        var sds = PooledPlot.ResidualSds(report);
        var used = Enumerable.Range(0, report.Cells.Count).Where(c => report.Cells[c].N >= 2).ToArray();
        Assert.Equal(used.Select(c => Math.Log10(report.Cells[c].Mean)), points.X);
        Assert.Equal(used.Select(c => Math.Log10(sds[c])), points.Y);
        var fit = panel.Series.OfType<StraightLine>().Single(s => s.Role == SeriesRole.Fit);
        var expected = PooledPlot.LeastSquares(points.X, points.Y)!;
        Assert.Equal(expected.Slope, fit.Slope, 1e-12);
        Assert.StartsWith("least-squares slope b = ", panel.Text[0], StringComparison.Ordinal);
    }

    [Fact]
    public void Least_squares_recovers_an_exact_line()
    {
        var fit = PooledPlot.LeastSquares([0.0, 1, 2, 3], [1.0, 3, 5, 7])!;
        Assert.Equal((1.0, 2.0), (fit.Intercept, fit.Slope));
        Assert.Null(PooledPlot.LeastSquares([1.0, 1], [2.0, 3]));
    }

    [Fact]
    public void Cell_sds_of_a_cell_means_model_are_the_cells_own_sds()
    {
        var (_, report) = PlotData.Analyze(PlotData.Mixed());
        var sds = PooledPlot.ResidualSds(report);
        for (var c = 0; c < report.Cells.Count; c++)
        {
            Assert.Equal(report.Cells[c].Sd, sds[c], 1e-12);
        }
    }
}
