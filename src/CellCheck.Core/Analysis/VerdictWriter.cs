namespace CellCheck.Core.Analysis;

/// <summary>
/// Writes the verdict of one response in plain language: which assumption is in doubt (by its primary check),
/// where and how strongly, what the supporting tests add, what could not be judged, and what the checks cannot see.
/// </summary>
internal static class VerdictWriter
{
    public static Verdict Write(VerdictInputs x, AnalysisOptions options)
    {
        var findings = new List<string>();
        var normality = x.Assumptions.Single(a => a.Assumption == AssumptionNames.Normality);
        var spread = x.Assumptions.Single(a => a.Assumption == AssumptionNames.EqualSpread);
        if (normality.Status == CheckStatus.Flag)
        {
            findings.Add("Residuals are not normal: " + Primary(normality) + " on the pooled studentized residuals (skewness "
                + NumberText.Fixed(x.Pooled.Skewness, 2) + ", excess kurtosis " + NumberText.Fixed(x.Pooled.ExcessKurtosis, 2) + ")."
                + SupportingText.CellsThatStandOut(x));
        }

        if (spread.Status == CheckStatus.Flag)
        {
            findings.Add("Spread differs across cells: " + Primary(spread) + SupportingText.SdRatio(x) + ".");
        }

        var independence = x.Assumptions.Single(a => a.Assumption == AssumptionNames.Independence);
        if (independence.Status == CheckStatus.Flag)
        {
            findings.Add("Residuals are not independent in run order: " + Primary(independence)
                + ". Look at residuals against run order for drift (an oven warming, reagent ageing) or carry-over; consider blocking by time.");
        }

        if (normality.Status == CheckStatus.Flag && spread.Status == CheckStatus.Flag)
        {
            findings.Add("Unequal spread alone makes pooled residuals look heavy-tailed; settle the spread question before judging normality.");
        }

        var judged = x.Assumptions.Where(a => a.Status != CheckStatus.NotTestable).ToList();
        var anyFlag = judged.Any(a => a.Status == CheckStatus.Flag);
        if (!anyFlag && judged.Count > 0)
        {
            findings.Add("No assumption is flagged at alpha " + NumberText.Value(options.Alpha) + " (Holm across "
 + string.Join(", ", judged.Select(a => a.Assumption)) + "). With " + ReplicateText(x.Census)
                + " per cell, moderate departures can go unseen: absence of evidence is not proof that the assumptions hold.");
        }

        ModelText.Add(x.Model, findings);
        if (x.Resolution is { Coarse: true } res)
        {
            findings.Add("Values are recorded coarsely (step " + NumberText.Value(res.Step ?? double.NaN, 6) + ", "
                + NumberText.Fixed(100 * res.TiedShare, 0) + "% of values tied within their cell): rounding alone can make normality tests reject, "
                + "so the normality decision uses a p-value simulated with the same rounding.");
        }

        SupportingText.Add(x, normality, spread, findings);
        NotJudged(x, normality, spread, findings);
        var status = anyFlag ? CheckStatus.Flag : judged.Count == 0 ? CheckStatus.NotTestable : CheckStatus.Pass;
        return new Verdict(status, findings, x.Assumptions, x.Operating);
    }

    private static string Primary(AssumptionVerdict a) =>
        a.Check + " p " + NumberText.P(a.P ?? double.NaN) + ", Holm-adjusted " + NumberText.P(a.PAdjusted ?? double.NaN);

    private static void NotJudged(VerdictInputs x, AssumptionVerdict normality, AssumptionVerdict spread, List<string> findings)
    {
        if (normality.Status == CheckStatus.NotTestable)
        {
            findings.Add("Normality could not be judged: " + ReasonText(normality.Reason) + ".");
        }

        if (spread.Status == CheckStatus.NotTestable)
        {
            findings.Add("Equal spread could not be judged: " + ReasonText(spread.Reason) + ".");
        }

        var independence = x.Assumptions.Single(a => a.Assumption == AssumptionNames.Independence);
        if (independence.Status == CheckStatus.NotTestable)
        {
            findings.Add("Independence could not be judged: " + ReasonText(independence.Reason) + ".");
        }

        var untested = x.Cells.Where(c => c.Checks[0].Status == CheckStatus.NotTestable).GroupBy(c => c.Checks[0].Reason)
            .Select(g => NumberText.Count(g.Count()) + " " + ReasonText(g.Key)).ToList();
        if (untested.Count > 0)
        {
            findings.Add("Within-cell normality could not be tested in " + string.Join(", ", untested) + ".");
        }

        if (x.Census.Singletons > 0 || x.Census.EmptyCount > 0)
        {
            findings.Add("The design is incomplete: " + NumberText.Count(x.Census.EmptyCount) + " empty combination(s) and "
                + NumberText.Count(x.Census.Singletons) + " singleton cell(s), which carry no information about residuals.");
        }
    }

    private static string ReplicateText(Cells.Census census) =>
        NumberText.Range(census.MinReplicates, census.MaxReplicates) + (census.MaxReplicates == 1 ? " value" : " values");

    /// <summary>Plain words for a reason code.</summary>
    public static string ReasonText(string? reason) => reason switch
    {
        Statistics.NotTestableReason.TooFewValues => "cell(s) with fewer than 3 values",
        Statistics.NotTestableReason.ZeroSpread => "cell(s) whose values are all equal",
        Statistics.NotTestableReason.TooManyValues => "cell(s) above 5000 values",
        Statistics.NotTestableReason.TooFewGroups => "fewer than two cells have two or more values",
        Statistics.NotTestableReason.AllGroupsOfTwo => "every cell has exactly two values",
        Statistics.NotTestableReason.ZeroVarianceGroup => "a cell has zero variance",
        Statistics.NotTestableReason.DegenerateWithinGroups => "the deviations do not vary within cells",
        Statistics.NotTestableReason.NoResidualDegreesOfFreedom => "no residual degrees of freedom",
        Statistics.NotTestableReason.NoRunOrder => "no run order was declared (add run_order: COLUMN, or run_order: file when the rows are in run order)",
        _ => reason ?? "unknown reason",
    };
}
