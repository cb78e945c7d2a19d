using CellCheck.Core.Analysis;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Plots;

/// <summary>
/// The cell grid: one panel per cell on a shared residual axis and a shared normal-quantile axis. A cell with at least
/// <see cref="PlotOptions.MinQq"/> values is a normal QQ plot (Blom positions, the line through the quartiles and a
/// seeded 95% pointwise simulation envelope, see <see cref="QqEnvelopes"/>); a smaller cell is a dot strip at 0. Each
/// panel prints n, the Shapiro-Wilk W and its adjusted p (or why it could not run); a cell flagged by a within-cell
/// check or holding a row named by the outlier screen is marked. Above <see cref="PlotOptions.MaxPanels"/> cells the
/// flagged cells come first, then those with the largest |studentized residual|, and a note says how many are not shown.
/// </summary>
public static class CellGridPlot
{
    /// <summary>Most columns of a factorial grid.</summary>
    public const int MaxColumns = 10;

    /// <summary>Columns of a wrapped grid.</summary>
    public const int WrapColumns = 8;

    /// <summary>Half-width of a dot strip's side-by-side offsets for near-equal values, in normal-quantile units.</summary>
    public const double StripOffset = 0.28;

    public static PlotModel Build(DesignSummary design, ResponseReport report, PlotOptions options)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(options);
        var cells = report.Cells;
        var rows = report.Rows;
        var members = Members(rows, cells.Count);
        var outliers = report.Model.Outliers.GroupBy(o => o.Line).ToDictionary(g => g.Key, g => g.First());
        var flagged = Enumerable.Range(0, cells.Count)
            .Select(c => cells[c].Status == CheckStatus.Flag || members[c].Any(i => outliers.ContainsKey(rows.Lines[i]))).ToArray();
        var shown = Choose(cells, members, rows, flagged, options.MaxPanels);
        var layout = CellLayout.For(design.Factors, cells, shown, options.MaxPanels, MaxColumns, WrapColumns);

        var values = shown.SelectMany(c => members[c]).Select(i => rows.Residuals[i]).Where(double.IsFinite).ToArray();
        var y = AxisScale.Linear(PlotText.WithUnit("residual", report.Unit), values.DefaultIfEmpty(-1).Min(), values.DefaultIfEmpty(1).Max());
        var largest = shown.Length == 0 ? 0 : shown.Max(c => members[c].Count);
        // with no QQ panel every cell is a dot strip and the x axis means nothing: no ticks, no title
        var x = largest >= options.MinQq
            ? AxisScale.Linear("normal quantile", -LastBlom(largest), LastBlom(largest))
            : new Axis(string.Empty, -1.3, 1.3, []);

        var envelopes = Envelopes(layout.Places.Where(c => c >= 0).Select(c => members[c].Count(i => double.IsFinite(rows.Residuals[i]))), options);
        var panels = new List<Panel>();
        foreach (var c in layout.Places)
        {
            if (c < 0)
            {
                panels.Add(new Panel(x, y, []) { Mark = PanelMark.Empty, Message = "no rows" });
                continue;
            }

            var panel = CellPanel(c, cells[c], members[c], rows, outliers, flagged[c], x, y, options, envelopes, design.Adjust);
            panels.Add(layout.Titled ? panel with { Title = string.Join(" / ", cells[c].Levels) } : panel);
        }

        var grid = layout.Grid with { SharedX = x, SharedY = y };
        var subtitle = new List<string>
        {
            "Residuals within each cell (model: " + report.Pooled.Residuals + "), all panels on one residual axis.",
            "Cells with " + NumberText.Count(options.MinQq) + " or more values: normal QQ plot with the line through the quartiles and a 95% pointwise envelope; "
                + "smaller cells: the values as dots.",
        };
        if (layout.Titled)
        {
            subtitle.Add("Panels are named by " + string.Join(" / ", design.Factors) + ".");
        }

        var notes = new List<string>();
        if (shown.Length < cells.Count)
        {
            notes.Add("Showing " + NumberText.Count(shown.Length) + " of " + NumberText.Count(cells.Count) + " cells: flagged cells first, then those with the largest "
                + "absolute studentized residual; " + NumberText.Count(cells.Count - shown.Length) + " cells are not shown (every row is in diagnostics.csv).");
        }

        if (envelopes.Count > 0)
        {
            notes.Add(EnvelopeNote(options));
        }

        return new PlotModel(PlotText.WithUnit(report.Response, report.Unit) + ": residuals cell by cell", subtitle, grid, panels)
        {
            Legend = Legend(panels),
            Notes = notes,
        };
    }

    /// <summary>How the envelope was made, for the notes under a picture.</summary>
    public static string EnvelopeNote(PlotOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        return "Envelope: " + NumberText.Count(options.Draws) + " normal samples of the same size (seed " + NumberText.Count(options.Seed)
            + "), each standardised by its own mean and SD; at each position the band runs from the 5th smallest to the 5th largest, "
            + "scaled by the plotted values' mean and SD. It is pointwise: a point outside it is unusual at that position alone.";
    }

    /// <summary>The simulated envelope of every panel size <paramref name="sizes"/> that gets one (a QQ panel drawing
    /// every point), side by side: each depends on its size and the seed alone, so each is what one panel would make.</summary>
    private static Dictionary<int, QqEnvelope> Envelopes(IEnumerable<int> sizes, PlotOptions options)
    {
        var simulated = sizes.Where(n => n >= options.MinQq && n <= PointThinning.MaxPoints).Distinct().ToArray();
        var envelopes = new QqEnvelope[simulated.Length];
        Parallel.For(0, simulated.Length, i => envelopes[i] = QqEnvelopes.Simulate(simulated[i], options.Seed, options.Draws));
        return simulated.Zip(envelopes).ToDictionary(pair => pair.First, pair => pair.Second);
    }

    /// <summary>The largest Blom score of n, as NormalScores.Blom(n) gives it (by symmetry, minus the smallest).</summary>
    private static double LastBlom(int n) => -NormalScores.At(n, 0);

    private static Panel CellPanel(int index, CellResult cell, List<int> member, RowDiagnostics rows, Dictionary<int, OutlierRow> outliers, bool flagged,
        Axis x, Axis y, PlotOptions options, Dictionary<int, QqEnvelope> envelopes, string adjust)
    {
        _ = index;
        var order = member.Where(i => double.IsFinite(rows.Residuals[i])).OrderBy(i => rows.Residuals[i]).ThenBy(i => i).ToArray();
        var sorted = order.Select(i => rows.Residuals[i]).ToArray();
        var n = sorted.Length;
        var series = new List<Series>();
        double[] xs;
        if (n >= options.MinQq)
        {
            var line = QuartileLine.Through(sorted);
            var (mean, sd) = QqEnvelopes.MeanSd(sorted);
            var thinned = n > PointThinning.MaxPoints;
            var ranks = thinned ? PointThinning.Ranks(n) : null;
            xs = ranks is null ? NormalScores.Blom(n) : ranks.Select(r => NormalScores.At(n, r)).ToArray();
            if (!envelopes.TryGetValue(n, out var envelope))
            {
                envelope = ranks is null ? QqEnvelopes.Simulate(n, options.Seed, options.Draws) : QqEnvelopes.OrderStatistics(n, ranks);
                envelopes[n] = envelope;
            }

            if (ranks is not null)
            {
                // a cell too large to draw every point: the extremes and evenly spaced ranks between them
                (sorted, order) = (ranks.Select(r => sorted[r]).ToArray(), ranks.Select(r => order[r]).ToArray());
            }

            if (sd > 0)
            {
                var (lower, upper) = envelope.Map(mean, sd);
                series.Add(new BandSeries(SeriesRole.Envelope, xs, lower, upper));
            }

            series.Add(new StraightLine(SeriesRole.Reference, line.Intercept, line.Slope));
        }
        else
        {
            xs = StripPositions(sorted, y.Max - y.Min);
        }

        var highlight = order.Select(i => outliers.ContainsKey(rows.Lines[i])).ToArray();
        series.Add(new PointSeries(SeriesRole.Points, Pick(xs, highlight, false), Pick(sorted, highlight, false)));
        if (highlight.Any(h => h))
        {
            series.Add(new PointSeries(SeriesRole.Highlight, Pick(xs, highlight, true), Pick(sorted, highlight, true))
            {
                Labels = order.Where((_, k) => highlight[k]).Select(i => (string?)("line " + NumberText.Count(rows.Lines[i]))).ToArray(),
            });
        }

        var mark = flagged ? PanelMark.Flagged : cell.Status == CheckStatus.NotTestable ? PanelMark.NotTestable : PanelMark.None;
        return new Panel(x, y, series) { Text = CellLines(cell, order.Where((_, k) => highlight[k]).Select(i => rows.Lines[i]), adjust), Mark = mark };
    }

    /// <summary>The header lines of a cell panel: n and W, the adjusted p (or why the check could not run), other flags.</summary>
    public static IReadOnlyList<string> CellLines(CellResult cell, IEnumerable<int> outlierLines, string adjust)
    {
        ArgumentNullException.ThrowIfNull(cell);
        ArgumentNullException.ThrowIfNull(outlierLines);
        var lines = new List<string>();
        var label = adjust switch { "holm" => "p (Holm)", "bh" => "p (BH)", _ => "p" };
        var sw = cell.Checks.FirstOrDefault(k => k.Check == CheckNames.ShapiroWilk);
        var first = "n = " + NumberText.Count(cell.N);
        if (sw?.Statistic is { } w)
        {
            first += ", W = " + NumberText.Fixed(w, 3);
        }

        lines.Add(first);
        if (sw is null || sw.Status == CheckStatus.NotTestable)
        {
            lines.Add("not testable: " + ReasonWords(sw?.Reason));
        }
        else
        {
            lines.Add(PlotText.PIs(label, sw.PAdjusted ?? sw.P ?? double.NaN));
        }

        foreach (var other in cell.Checks.Where(k => k.Check != CheckNames.ShapiroWilk && k.Status == CheckStatus.Flag))
        {
            lines.Add(PlotText.PIs(PlotText.CheckName(other.Check) + " " + label, other.PAdjusted ?? other.P ?? double.NaN));
        }

        var named = outlierLines.ToArray();
        if (named.Length > 0)
        {
            lines.Add("outlier: line " + string.Join(", ", named.Select(NumberText.Count)));
        }

        return lines;
    }

    private static string ReasonWords(string? reason) => reason switch
    {
        NotTestableReason.TooFewValues => "fewer than 3 values",
        NotTestableReason.ZeroSpread => "all residuals equal",
        NotTestableReason.TooManyValues => "over 5000 values",
        null => "no check ran",
        _ => reason,
    };

    /// <summary>Positions of a dot strip: 0, with runs of near-equal values (within 3% of the axis range) set side by side.</summary>
    public static double[] StripPositions(IReadOnlyList<double> sorted, double range)
    {
        ArgumentNullException.ThrowIfNull(sorted);
        var xs = new double[sorted.Count];
        var tolerance = 0.03 * range;
        var start = 0;
        for (var i = 1; i <= sorted.Count; i++)
        {
            if (i == sorted.Count || sorted[i] - sorted[i - 1] > tolerance)
            {
                var m = i - start;
                for (var j = 0; j < m; j++)
                {
                    xs[start + j] = (j - ((m - 1) / 2.0)) * StripOffset;
                }

                start = i;
            }
        }

        return xs;
    }

    private static double[] Pick(double[] values, bool[] mask, bool keep) => values.Where((_, k) => mask[k] == keep).ToArray();

    private static List<int>[] Members(RowDiagnostics rows, int cellCount)
    {
        var members = new List<int>[cellCount];
        for (var c = 0; c < cellCount; c++)
        {
            members[c] = [];
        }

        for (var i = 0; i < rows.Cells.Length; i++)
        {
            members[rows.Cells[i]].Add(i);
        }

        return members;
    }

    /// <summary>All cells in report order when they fit; otherwise the flagged cells (smallest adjusted p first), then the
    /// cells with the largest |studentized residual|.</summary>
    private static int[] Choose(IReadOnlyList<CellResult> cells, List<int>[] members, RowDiagnostics rows, bool[] flagged, int maxPanels)
    {
        if (cells.Count <= maxPanels)
        {
            return Enumerable.Range(0, cells.Count).ToArray();
        }

        double Extreme(int c) => members[c].Select(i => Math.Abs(rows.Studentized[i])).Where(double.IsFinite).DefaultIfEmpty(0).Max();
        double SmallestP(int c) => cells[c].Checks.Select(k => k.PAdjusted ?? k.P ?? 1.0).DefaultIfEmpty(1.0).Min();
        return Enumerable.Range(0, cells.Count)
            .OrderByDescending(c => flagged[c])
            .ThenBy(c => flagged[c] ? SmallestP(c) : 0)
            .ThenByDescending(Extreme)
            .ThenBy(c => c)
            .Take(maxPanels)
            .ToArray();
    }

    private static List<LegendItem> Legend(List<Panel> panels)
    {
        var items = new List<LegendItem> { new(LegendKey.Points, "residual") };
        var all = panels.SelectMany(p => p.Series).ToList();
        if (all.Any(s => s.Role == SeriesRole.Reference))
        {
            items.Add(new(LegendKey.Reference, "line through the quartiles"));
            items.Add(new(LegendKey.Envelope, "95% pointwise envelope"));
        }

        if (all.Any(s => s.Role == SeriesRole.Highlight))
        {
            items.Add(new(LegendKey.Highlight, "row named by the outlier screen"));
        }

        if (panels.Any(p => p.Mark == PanelMark.Flagged))
        {
            items.Add(new(LegendKey.Flagged, "cell flagged by a check"));
        }

        if (panels.Any(p => p.Mark == PanelMark.NotTestable))
        {
            items.Add(new(LegendKey.NotTestable, "cell that could not be tested"));
        }

        return items;
    }
}
