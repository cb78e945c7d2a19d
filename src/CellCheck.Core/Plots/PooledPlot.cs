using CellCheck.Core.Analysis;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Plots;

/// <summary>
/// The pooled picture, four panels: a normal QQ plot of the internally studentized residuals with a seeded 95% pointwise
/// envelope; studentized residuals against fitted values; studentized residuals in run order (when a run order was
/// declared) with block boundaries (when each block is one stretch of the run order); and spread against level, the
/// log SD of each cell against the log of its mean with the least-squares slope. A panel whose assumption (or the outlier
/// screen) is flagged is marked. Rows whose studentized residual is undefined (leverage one) are left out and counted.
/// </summary>
public static class PooledPlot
{
    /// <summary>Smallest ratio of the largest to the smallest cell mean for which a spread-level slope is fitted: over a
    /// narrower range of levels the slope is mostly noise.</summary>
    public const double MinLevelRatio = 1.25;

    private const string Studentized = "studentized residual";

    private const string CellMeans = "cell-means";

    /// <summary>Most flagged rows named by a label in one panel.</summary>
    private const int MaxLabels = 10;

    public static PlotModel Build(DesignSummary design, ResponseReport report, PlotOptions options)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(options);
        var rows = report.Rows;
        var finite = Enumerable.Range(0, rows.Studentized.Length).Where(i => double.IsFinite(rows.Studentized[i])).ToArray();
        var outliers = report.Model.Outliers.GroupBy(o => o.Line).ToDictionary(g => g.Key, g => g.First());
        var notes = new List<string>();
        if (finite.Length < rows.Studentized.Length)
        {
            notes.Add(NumberText.Count(rows.Studentized.Length - finite.Length) + " row(s) have no studentized residual (leverage one, or no residual "
                + "variation at all) and are not shown.");
        }

        // the QQ panel (a sort of every studentized residual) beside the others, which add their notes in order; the
        // per-row columns they read are built first (each on first use)
        _ = (rows.Lines, rows.Fitted, rows.RunOrder, rows.BlockCodes);
        var panels = new Panel[4];
        Parallel.Invoke(
            () => panels[0] = Qq(report, rows, finite, outliers, options),
            () =>
            {
                panels[1] = AgainstFitted(report, rows, finite, outliers);
                panels[2] = RunOrder(design, report, rows, finite, outliers, notes);
                panels[3] = SpreadLevel(design, report, notes);
            });
        if (finite.Length > PointThinning.MaxPoints)
        {
            notes.Add(PointThinning.Note(finite.Length));
            notes.Add("The QQ band is the 95% pointwise range of normal order statistics from their exact (Beta) distribution, not simulated.");
        }
        else if (panels[0].Series.Any(s => s.Role == SeriesRole.Envelope))
        {
            notes.Add(CellGridPlot.EnvelopeNote(options));
        }

        var subtitle = new List<string>
        {
            "Residuals pooled over all cells (model: " + report.Pooled.Residuals + "), internally studentized, " + NumberText.Count(finite.Length) + " rows.",
        };
        return new PlotModel(PlotText.WithUnit(report.Response, report.Unit) + ": pooled residuals", subtitle, new PanelGrid(2, 2), panels)
        {
            Legend = Legend(panels),
            Notes = notes,
        };
    }

    private static Panel Qq(ResponseReport report, RowDiagnostics rows, int[] finite, Dictionary<int, OutlierRow> outliers, PlotOptions options)
    {
        var keys = new double[finite.Length];
        var order = (int[])finite.Clone();
        for (var k = 0; k < keys.Length; k++)
        {
            keys[k] = rows.Studentized[finite[k]];
        }

        RadixOrder.Sort(keys, order); // stable: ties stay in row order
        var n = keys.Length;
        var text = AssumptionLines(report.Verdict, AssumptionNames.Normality);
        var mark = Mark(report.Verdict, AssumptionNames.Normality);
        if (n < 3)
        {
            return Message("Normal QQ plot of the studentized residuals", "fewer than 3 studentized residuals: nothing to plot", text);
        }

        var line = QuartileLine.Through(keys);
        var (mean, sd) = QqEnvelopes.MeanSd(keys);
        double[] xs, sorted;
        int[] shown;
        QqEnvelope envelope;
        if (n <= PointThinning.MaxPoints)
        {
            (xs, sorted, shown) = (NormalScores.Blom(n), keys, order);
            envelope = QqEnvelopes.Simulate(n, options.Seed, options.Draws);
        }
        else
        {
            var ranks = PointThinning.Ranks(n);
            xs = ranks.Select(r => NormalScores.At(n, r)).ToArray();
            sorted = ranks.Select(r => keys[r]).ToArray();
            shown = ranks.Select(r => order[r]).ToArray();
            envelope = QqEnvelopes.OrderStatistics(n, ranks);
        }

        var (lower, upper) = envelope.Map(mean, sd);
        var series = new List<Series>
        {
            new BandSeries(SeriesRole.Envelope, xs, lower, upper),
            new StraightLine(SeriesRole.Reference, line.Intercept, line.Slope),
        };
        series.AddRange(PointsWithHighlights(xs, shown, sorted, rows, outliers));
        var lo = Math.Min(sorted[0], lower.Min());
        var hi = Math.Max(sorted[^1], upper.Max());
        var x = AxisScale.Linear("normal quantile", xs[0], xs[^1]);
        var y = AxisScale.Linear(Studentized, lo, hi, 6);
        return new Panel(x, y, series) { Title = "Normal QQ plot of the studentized residuals", Text = text, Mark = mark };
    }

    /// <summary>The positions of <paramref name="rowIndex"/> to draw (all, or a thinned set that keeps every outlier).</summary>
    private static int[] Drawn(int[] rowIndex, double[] ys, RowDiagnostics rows, Dictionary<int, OutlierRow> outliers)
    {
        if (ys.Length <= PointThinning.MaxPoints)
        {
            return PointThinning.Positions(ys, new HashSet<int>());
        }

        var always = new HashSet<int>();
        for (var k = 0; k < rowIndex.Length; k++)
        {
            if (outliers.Count > 0 && outliers.ContainsKey(rows.Lines[rowIndex[k]]))
            {
                always.Add(k);
            }
        }

        return PointThinning.Positions(ys, always);
    }

    private static Panel AgainstFitted(ResponseReport report, RowDiagnostics rows, int[] finite, Dictionary<int, OutlierRow> outliers)
    {
        const string title = "Studentized residuals against fitted values";
        var outlierCheck = report.Model.Checks.FirstOrDefault(c => c.Check == CheckNames.Outliers);
        var text = new List<string> { OutlierLine(report, outlierCheck) };
        var mark = outlierCheck?.Status == CheckStatus.Flag ? PanelMark.Flagged : PanelMark.None;
        if (finite.Length == 0)
        {
            return Message(title, "no studentized residuals to plot", text);
        }

        var fitted = rows.Fitted;
        var ys = PlotValues.Gather(rows.Studentized, finite);
        var (xLow, xHigh) = PlotValues.Range(fitted, finite);
        var (yLow, yHigh) = PlotValues.Range(ys);
        var x = AxisScale.Linear(PlotText.WithUnit("fitted " + report.Response, report.Unit), xLow, xHigh);
        var y = AxisScale.Linear(Studentized, Math.Min(0, yLow), Math.Max(0, yHigh), 6);
        var drawn = Drawn(finite, ys, rows, outliers);
        if (drawn.Length < ys.Length)
        {
            (ys, finite) = (drawn.Select(k => ys[k]).ToArray(), drawn.Select(k => finite[k]).ToArray());
        }

        var xs = PlotValues.Gather(fitted, finite);

        var series = new List<Series> { new StraightLine(SeriesRole.Guide, 0, 0) };
        series.AddRange(PointsWithHighlights(xs, finite, ys, rows, outliers));
        return new Panel(x, y, series) { Title = title, Text = text, Mark = mark };
    }

    private static Panel RunOrder(DesignSummary design, ResponseReport report, RowDiagnostics rows, int[] finite, Dictionary<int, OutlierRow> outliers, List<string> notes)
    {
        const string title = "Studentized residuals in run order";
        var text = AssumptionLines(report.Verdict, AssumptionNames.Independence);
        if (rows.RunOrder is not { } runOrder)
        {
            return Message(title, "No run order was declared, so there is nothing to plot here. Add run_order: COLUMN to the design file "
                + "(or run_order: file when the rows are in run order).", []);
        }

        var placed = RunPlacement.Placed(runOrder, finite); // stable: shared run positions stay in row order
        if (placed.Length < finite.Length)
        {
            notes.Add(NumberText.Count(finite.Length - placed.Length) + " row(s) without a run position are not in the run-order panel.");
        }

        if (placed.Length == 0)
        {
            return Message(title, finite.Length == 0 ? "no studentized residuals to plot" : "no row has a run position", text);
        }

        var first = runOrder[placed[0]];
        var span = runOrder[placed[^1]] - first;
        var (scale, label) = TimeScale(first, span, design.RunOrder);
        var (offset, unit) = (scale.HasValue ? first : 0, scale ?? 1);
        double At(int row) => (runOrder[row] - offset) / unit;
        var ys = PlotValues.Gather(rows.Studentized, placed);
        var (yLow, yHigh) = PlotValues.Range(ys);
        var x = AxisScale.Linear(label, At(placed[0]), At(placed[^1]));
        var y = AxisScale.Linear(Studentized, Math.Min(0, yLow), Math.Max(0, yHigh), 6);
        var series = new List<Series> { new StraightLine(SeriesRole.Guide, 0, 0) };
        if (Boundaries(design, rows, placed, At) is { } rules)
        {
            series.Add(rules);
        }
        else if (rows.BlockCodes.Count > 0)
        {
            notes.Add("Blocks are interleaved in run order, so no block boundaries are drawn.");
        }

        var drawn = Drawn(placed, ys, rows, outliers);
        var thinned = drawn.Length < ys.Length;
        if (thinned)
        {
            (ys, placed) = (drawn.Select(k => ys[k]).ToArray(), drawn.Select(k => placed[k]).ToArray());
        }

        var xs = Array.ConvertAll(placed, At);
        if (!thinned)
        {
            // a path through a thinned sequence would draw steps that are not in the data: points only
            series.Add(new LineSeries(SeriesRole.Path, xs, ys));
        }

        series.AddRange(PointsWithHighlights(xs, placed, ys, rows, outliers));
        return new Panel(x, y, series) { Title = title, Text = text, Mark = Mark(report.Verdict, AssumptionNames.Independence) };
    }

    /// <summary>Run positions as given, or, for times (values above 10⁷, as timestamps in seconds are), the time since the first run.</summary>
    private static (double? Scale, string Label) TimeScale(double first, double span, string? column)
    {
        if (Math.Abs(first) < 1e7)
        {
            return (null, "run order" + (column is null ? string.Empty : " (" + column + ")"));
        }

        return span switch
        {
            > 2 * 86400 => (86400, "days since the first run"),
            > 3 * 3600 => (3600, "hours since the first run"),
            _ => (60, "minutes since the first run"),
        };
    }

    /// <summary>Block boundaries in run order when each level of the first block factor is one unbroken stretch.</summary>
    private static RuleSeries? Boundaries(DesignSummary design, RowDiagnostics rows, int[] placed, Func<int, double> at)
    {
        if (rows.BlockCodes.Count == 0 || placed.Length == 0)
        {
            return null;
        }

        var codes = rows.BlockCodes[0];
        var stretches = new List<int> { 0 };
        for (var k = 1; k < placed.Length; k++)
        {
            if (codes[placed[k]] != codes[placed[k - 1]])
            {
                stretches.Add(k);
            }
        }

        var levels = stretches.Select(k => codes[placed[k]]).ToArray();
        if (levels.Distinct().Count() != levels.Length)
        {
            return null;
        }

        var names = rows.BlockLevels.Count > 0 ? rows.BlockLevels[0] : null;
        var block = design.Blocks.Count > 0 ? design.Blocks[0] : "block";
        var labels = levels.Select(l => block + " " + (names is not null && l >= 0 && l < names.Count ? names[l] : NumberText.Count(l + 1))).ToArray();
        var between = stretches.Skip(1).Select(k => (at(placed[k - 1]) + at(placed[k])) / 2).ToArray();
        return new RuleSeries(SeriesRole.Boundary, between, labels);
    }

    private static Panel SpreadLevel(DesignSummary design, ResponseReport report, List<string> notes)
    {
        const string title = "Spread against level (log scales)";
        var text = AssumptionLines(report.Verdict, AssumptionNames.EqualSpread);
        var sds = ResidualSds(report);
        var usable = Enumerable.Range(0, report.Cells.Count)
            .Where(c => report.Cells[c].N >= 2 && sds[c] > 0 && double.IsFinite(sds[c]) && report.Cells[c].Mean > 0).ToArray();
        var replicated = report.Cells.Count(c => c.N >= 2);
        if (usable.Length < 2)
        {
            var why = replicated < 2 ? "fewer than two cells have two or more values, so there is no spread to compare"
                : "the cell means are not positive, so they have no logarithm";
            return Message(title, "Nothing to plot: " + why + ".", text);
        }

        if (usable.Length < replicated)
        {
            notes.Add(NumberText.Count(replicated - usable.Length) + " replicated cell(s) with a mean at or below zero or no spread are not in the spread panel.");
        }

        var means = usable.Select(c => report.Cells[c].Mean).ToArray();
        var spreads = usable.Select(c => sds[c]).ToArray();
        var xs = means.Select(Math.Log10).ToArray();
        var ys = spreads.Select(Math.Log10).ToArray();
        var x = AxisScale.Log10(PlotText.WithUnit("cell mean", report.Unit), means.Min(), means.Max());
        var y = AxisScale.Log10(PlotText.WithUnit("SD of the cell's residuals", report.Unit), spreads.Min(), spreads.Max());
        var series = new List<Series>();
        var fit = LeastSquares(xs, ys);
        var ratio = means.Max() / means.Min();
        if (fit is not null && usable.Length >= 3 && ratio >= MinLevelRatio)
        {
            series.Add(new StraightLine(SeriesRole.Fit, fit.Intercept, fit.Slope));
            text.Insert(0, "least-squares slope b = " + PlotText.Fixed(fit.Slope, 2));
            notes.Add("Spread against level: a slope b near 0 means the spread does not follow the level; near 1, the SD grows in proportion "
                + "to the mean, which a log scale would even out (a power transformation y^(1 − b) in general).");
        }
        else if (fit is not null && usable.Length >= 3)
        {
            text.Insert(0, "slope b = " + PlotText.Fixed(fit.Slope, 2) + ", not drawn: the largest cell mean is only "
                + PlotText.Fixed(100 * (ratio - 1), 0) + "% above the smallest, too little for a slope to mean much");
        }

        // name the cells with the largest and the smallest SD
        var largest = Array.IndexOf(spreads, spreads.Max());
        var smallest = Array.IndexOf(spreads, spreads.Min());
        series.Add(new PointSeries(SeriesRole.Points, xs, ys)
        {
            Labels = usable.Select((c, k) => k == largest || k == smallest ? string.Join(" / ", report.Cells[c].Levels) : null).ToArray(),
        });
        notes.Add("The spread panel names the cells with the largest and the smallest SD by " + string.Join(" / ", design.Factors) + "."
            + (report.Model.Info.Name == CellMeans ? string.Empty : " Each SD is that of the cell's residuals from the model" + (design.Blocks.Count > 0 ? ", so block effects are taken out." : ".")));
        return new Panel(x, y, series) { Title = title, Text = text, Mark = Mark(report.Verdict, AssumptionNames.EqualSpread) };
    }

    /// <summary>The SD (n − 1 divisor) of each cell's residuals; NaN for a single value. For the cell-means model this is the cell's SD.</summary>
    public static double[] ResidualSds(ResponseReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        var groups = new List<double>[report.Cells.Count];
        for (var c = 0; c < groups.Length; c++)
        {
            groups[c] = [];
        }

        for (var i = 0; i < report.Rows.Cells.Length; i++)
        {
            groups[report.Rows.Cells[i]].Add(report.Rows.Residuals[i]);
        }

        return groups.Select(g => g.Count < 2 ? double.NaN : QqEnvelopes.MeanSd(g.ToArray()).Sd).ToArray();
    }

    /// <summary>Ordinary least squares of y on x, or null when x does not vary.</summary>
    public static LineCoefficients? LeastSquares(IReadOnlyList<double> x, IReadOnlyList<double> y)
    {
        ArgumentNullException.ThrowIfNull(x);
        ArgumentNullException.ThrowIfNull(y);
        var mx = x.Average();
        var my = y.Average();
        double sxx = 0, sxy = 0;
        for (var i = 0; i < x.Count; i++)
        {
            sxx += (x[i] - mx) * (x[i] - mx);
            sxy += (x[i] - mx) * (y[i] - my);
        }

        if (!(sxx > 0))
        {
            return null;
        }

        var slope = sxy / sxx;
        return new LineCoefficients(my - (slope * mx), slope);
    }

    private static IEnumerable<Series> PointsWithHighlights(double[] xs, int[] rowIndex, double[] ys, RowDiagnostics rows, Dictionary<int, OutlierRow> outliers)
    {
        var flagged = rowIndex.Select(i => outliers.ContainsKey(rows.Lines[i])).ToArray();
        yield return new PointSeries(SeriesRole.Points, xs.Where((_, k) => !flagged[k]).ToArray(), ys.Where((_, k) => !flagged[k]).ToArray());
        if (flagged.Any(f => f))
        {
            // label the most extreme flagged rows only: dozens of labels cover each other (all rows are in the report)
            var fy = ys.Where((_, k) => flagged[k]).ToArray();
            var labelled = fy.Length <= MaxLabels ? 0.0 : fy.Select(Math.Abs).OrderDescending().ElementAt(MaxLabels - 1);
            yield return new PointSeries(SeriesRole.Highlight, xs.Where((_, k) => flagged[k]).ToArray(), fy)
            {
                Labels = rowIndex.Where((_, k) => flagged[k]).Select((i, j) => Math.Abs(fy[j]) >= labelled ? (string?)("line " + NumberText.Count(rows.Lines[i])) : null).ToArray(),
            };
        }
    }

    private static List<string> AssumptionLines(Verdict verdict, string assumption)
    {
        var a = verdict.Assumptions.FirstOrDefault(v => v.Assumption == assumption);
        if (a is null)
        {
            return [];
        }

        if (a.Status == CheckStatus.NotTestable || a.P is null)
        {
            return [assumption + ": not testable (" + (a.Reason ?? "no check ran") + ")"];
        }

        var line = assumption + ": " + PlotText.PIs(PlotText.CheckName(a.Check) + " p", a.P.Value);
        if (a.PAdjusted is { } adjusted)
        {
            line += ", " + PlotText.PIs("Holm p", adjusted);
        }

        return [line + (a.Status == CheckStatus.Flag ? ", flagged" : ", pass")];
    }

    private static string OutlierLine(ResponseReport report, CheckResult? check)
    {
        if (check is null || check.Status == CheckStatus.NotTestable)
        {
            return "outlier screen: not testable (too few residual degrees of freedom)";
        }

        if (report.Model.Outliers.Count == 0)
        {
            return "outlier screen: no row named (largest |t| = " + PlotText.Fixed(check.Statistic ?? double.NaN, 2) + ", " + PlotText.PIs("Bonferroni p", check.P ?? double.NaN) + ")";
        }

        const int listed = 5;
        var outliers = report.Model.Outliers;
        return "outlier screen: " + string.Join("; ", outliers.Take(listed).Select(o =>
            "line " + NumberText.Count(o.Line) + " (t = " + PlotText.Fixed(o.Studentized, 2) + ", " + PlotText.PIs("Bonferroni p", o.PAdjusted) + ")"))
            + (outliers.Count > listed ? "; and " + NumberText.Count(outliers.Count - listed) + " more rows (all in the report)" : string.Empty);
    }

    private static PanelMark Mark(Verdict verdict, string assumption) =>
        verdict.Assumptions.FirstOrDefault(v => v.Assumption == assumption)?.Status == CheckStatus.Flag ? PanelMark.Flagged : PanelMark.None;

    private static Panel Message(string title, string message, IReadOnlyList<string> text)
    {
        var blank = new Axis(string.Empty, 0, 1, []);
        return new Panel(blank, blank, []) { Title = title, Text = text, Message = message };
    }

    private static List<LegendItem> Legend(Panel[] panels)
    {
        var all = panels.SelectMany(p => p.Series).ToList();
        var items = new List<LegendItem> { new(LegendKey.Points, "residual; in the spread panel, one cell") };
        if (all.Any(s => s.Role == SeriesRole.Reference))
        {
            items.Add(new(LegendKey.Reference, "line through the quartiles"));
            items.Add(new(LegendKey.Envelope, "95% pointwise envelope"));
        }

        if (all.Any(s => s.Role == SeriesRole.Fit))
        {
            items.Add(new(LegendKey.Fit, "least-squares line"));
        }

        if (all.Any(s => s.Role == SeriesRole.Boundary))
        {
            items.Add(new(LegendKey.Boundary, "block boundary"));
        }

        if (all.Any(s => s.Role == SeriesRole.Highlight))
        {
            items.Add(new(LegendKey.Highlight, "row named by the outlier screen"));
        }

        if (panels.Any(p => p.Mark == PanelMark.Flagged))
        {
            items.Add(new(LegendKey.Flagged, "panel whose check is flagged"));
        }

        return items;
    }
}
