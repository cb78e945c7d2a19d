using CellCheck.Core.Analysis;
using CellCheck.Core.Plots;

namespace CellCheck.Core.Tests.Plots;

public sealed class CellGridPlotTests
{
    private static readonly (DesignSummary Design, ResponseReport Report) Mixed = PlotData.Analyze(PlotData.Mixed());

    private static Panel PanelOf(PlotModel model, string a, string b)
    {
        var row = model.Grid.RowLabels.ToList().IndexOf(a);
        var column = model.Grid.ColumnHeaders[0].Spans.Select(s => s.Label).ToList().IndexOf(b);
        return model.Panels[(row * model.Grid.Columns) + column];
    }

    [Fact]
    public void Rows_are_the_levels_of_the_first_factor_in_numeric_order_and_columns_the_other()
    {
        var model = CellGridPlot.Build(Mixed.Design, Mixed.Report, PlotOptions.Default);
        Assert.Equal((3, 2), (model.Grid.Rows, model.Grid.Columns));
        Assert.Equal("a", model.Grid.RowTitle);
        Assert.Equal(["9", "10", "100"], model.Grid.RowLabels);
        var band = Assert.Single(model.Grid.ColumnHeaders);
        Assert.Equal("b", band.Title);
        Assert.Equal(["p", "q"], band.Spans.Select(s => s.Label));
        Assert.Equal(6, model.Panels.Count);
        Assert.Contains("y (mm)", model.Title, StringComparison.Ordinal);
    }

    [Fact]
    public void A_cell_of_five_or_more_is_a_qq_plot_at_blom_positions_with_line_and_envelope()
    {
        var model = CellGridPlot.Build(Mixed.Design, Mixed.Report, PlotOptions.Default);
        var panel = PanelOf(model, "10", "p");
        var points = panel.Series.OfType<PointSeries>().Single(s => s.Role == SeriesRole.Points);
        Assert.Equal(NormalScores.Blom(6), points.X);
        Assert.Equal(points.Y.OrderBy(v => v), points.Y);
        var band = panel.Series.OfType<BandSeries>().Single();
        Assert.Equal(points.X, band.X);
        var (mean, sd) = QqEnvelopes.MeanSd(points.Y.ToArray());
        var (lower, upper) = QqEnvelopes.Simulate(6, PlotOptions.DefaultSeed).Map(mean, sd);
        Assert.Equal(lower, band.Lower);
        Assert.Equal(upper, band.Upper);
        var line = panel.Series.OfType<StraightLine>().Single();
        var expected = QuartileLine.Through(points.Y.ToArray());
        Assert.Equal((expected.Intercept, expected.Slope), (line.Intercept, line.Slope));
        Assert.Equal(["n = 6, W = " + NumberText.Fixed(Mixed.Report.Cells.Single(c => c.Levels.SequenceEqual(["10", "p"])).Checks[0].Statistic!.Value, 3),
            "p (Holm) = 1.000"], panel.Text);
    }

    [Fact]
    public void A_small_cell_is_a_dot_strip_and_a_cell_of_two_says_why_it_was_not_tested()
    {
        var model = CellGridPlot.Build(Mixed.Design, Mixed.Report, PlotOptions.Default);
        var strip = PanelOf(model, "9", "p");
        Assert.DoesNotContain(strip.Series, s => s is BandSeries or StraightLine);
        Assert.All(strip.Series.OfType<PointSeries>().Single().X, x => Assert.InRange(x, -0.5, 0.5));
        var two = PanelOf(model, "9", "q");
        Assert.Equal(PanelMark.NotTestable, two.Mark);
        Assert.Equal(["n = 2", "not testable: fewer than 3 values"], two.Text);
        Assert.Contains(model.Legend, l => l.Key == LegendKey.NotTestable);
    }

    [Fact]
    public void A_row_named_by_the_outlier_screen_marks_its_cell_and_is_labelled_by_its_line()
    {
        var model = CellGridPlot.Build(Mixed.Design, Mixed.Report, PlotOptions.Default);
        var outlier = Assert.Single(Mixed.Report.Model.Outliers);
        var panel = PanelOf(model, "100", "q");
        Assert.Equal(PanelMark.Flagged, panel.Mark);
        var highlight = panel.Series.OfType<PointSeries>().Single(s => s.Role == SeriesRole.Highlight);
        Assert.Equal(["line " + outlier.Line], highlight.Labels!);
        Assert.Contains("outlier: line " + outlier.Line, panel.Text);
        Assert.Contains(model.Legend, l => l.Key == LegendKey.Flagged);
    }

    [Fact]
    public void Every_panel_shares_one_residual_axis_that_holds_every_residual()
    {
        var model = CellGridPlot.Build(Mixed.Design, Mixed.Report, PlotOptions.Default);
        var y = model.Grid.SharedY!;
        Assert.All(model.Panels, p => Assert.Same(y, p.Y));
        Assert.All(Mixed.Report.Rows.Residuals, r => Assert.InRange(r, y.Min, y.Max));
        Assert.Equal("residual (mm)", y.Label);
    }

    [Fact]
    public void An_empty_combination_keeps_its_place()
    {
        var rows = PlotData.Mixed().Where(r => !(r.Item1 == "9" && r.Item2 == "q")).ToArray();
        var (design, report) = PlotData.Analyze(rows);
        var model = CellGridPlot.Build(design, report, PlotOptions.Default);
        Assert.Equal(6, model.Panels.Count);
        Assert.Equal(PanelMark.Empty, PanelOf(model, "9", "q").Mark);
    }

    [Fact]
    public void Above_the_panel_limit_flagged_then_most_extreme_cells_come_first_and_a_note_counts_the_rest()
    {
        var model = CellGridPlot.Build(Mixed.Design, Mixed.Report, PlotOptions.Default with { MaxPanels = 3 });
        Assert.Equal(3, model.Panels.Count);
        Assert.Equal("100 / q", model.Panels[0].Title);
        Assert.Equal(PanelMark.Flagged, model.Panels[0].Mark);
        Assert.Contains(model.Notes, n => n.StartsWith("Showing 3 of 6 cells", StringComparison.Ordinal) && n.Contains("3 cells are not shown", StringComparison.Ordinal));
        Assert.Contains(model.Subtitle, s => s.Contains("named by a / b", StringComparison.Ordinal));
        Assert.Empty(model.Grid.RowLabels);
    }

    [Fact]
    public void Building_twice_gives_the_same_numbers()
    {
        var a = CellGridPlot.Build(Mixed.Design, Mixed.Report, PlotOptions.Default);
        var b = CellGridPlot.Build(Mixed.Design, Mixed.Report, PlotOptions.Default);
        for (var k = 0; k < a.Panels.Count; k++)
        {
            var bands = (a.Panels[k].Series.OfType<BandSeries>().ToArray(), b.Panels[k].Series.OfType<BandSeries>().ToArray());
            Assert.Equal(bands.Item1.SelectMany(s => s.Upper), bands.Item2.SelectMany(s => s.Upper));
        }
    }
}
