using CellCheck.Core.Cells;
using CellCheck.Core.Data;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Analysis;

/// <summary>
/// Writes the verdict of one response in plain language: which assumption is in doubt, where and how strongly,
/// what could not be judged, and a reminder of what the checks cannot see.
/// </summary>
internal static class VerdictWriter
{
    private const int CellsNamed = 3;

    public static Verdict Write(Census census, IReadOnlyList<CellResult> cells, PooledResult pooled, SpreadResult spread,
        IReadOnlyList<FactorColumn> factors, AnalysisOptions options)
    {
        var findings = new List<string>();
        var flagged = CellFindings(cells, factors, findings);
        if (pooled.Status == CheckStatus.Flag)
        {
            findings.Add("Pooled residuals depart from normality (" + FlaggedTests(pooled.Checks) + "; skewness "
                + NumberText.Fixed(pooled.Skewness, 2) + ", excess kurtosis " + NumberText.Fixed(pooled.ExcessKurtosis, 2) + ").");
        }

        if (spread.Status == CheckStatus.Flag)
        {
            var text = "Spread differs across cells (" + FlaggedTests(spread.Checks) + ")";
            if (spread.SdRatio is { } ratio && spread.LargestSdCell is { } hi && spread.SmallestSdCell is { } lo)
            {
                text += "; the largest cell SD is " + NumberText.Fixed(ratio, 1) + " times the smallest (" + CellText.Describe(cells[hi].Levels, factors)
                    + " against " + CellText.Describe(cells[lo].Levels, factors) + ")";
            }

            findings.Add(text + ".");
        }

        if (spread.Status == CheckStatus.Flag && pooled.Status == CheckStatus.Flag)
        {
            findings.Add("Unequal spread alone makes pooled residuals look heavy-tailed; settle the spread question before judging pooled normality.");
        }

        var anyFlag = flagged || pooled.Status == CheckStatus.Flag || spread.Status == CheckStatus.Flag;
        if (!anyFlag)
        {
            findings.Add("No check raised doubt at alpha " + NumberText.Value(options.Alpha) + ". With " + ReplicateText(census)
                + " per cell, moderate departures can go unseen: absence of evidence is not proof that the assumptions hold.");
        }

        NotTestableFindings(cells, spread, findings);
        if (census.Singletons > 0 || census.EmptyCount > 0)
        {
            findings.Add("The design is incomplete: " + NumberText.Count(census.EmptyCount) + " empty combination(s) and "
                + NumberText.Count(census.Singletons) + " singleton cell(s).");
        }

        var status = anyFlag ? CheckStatus.Flag : pooled.Status == CheckStatus.NotTestable && spread.Status == CheckStatus.NotTestable
            && cells.All(c => c.Status == CheckStatus.NotTestable) ? CheckStatus.NotTestable : CheckStatus.Pass;
        return new Verdict(status, findings);
    }

    private static bool CellFindings(IReadOnlyList<CellResult> cells, IReadOnlyList<FactorColumn> factors, List<string> findings)
    {
        var flagged = cells.Select((c, i) => (c, i)).Where(t => t.c.Status == CheckStatus.Flag)
            .OrderBy(t => t.c.Checks.Min(k => k.PAdjusted ?? 1.0)).ToList();
        if (flagged.Count == 0)
        {
            return false;
        }

        var testable = cells.Count(c => c.Status != CheckStatus.NotTestable);
        var named = string.Join("; ", flagged.Take(CellsNamed).Select(t => CellText.Describe(t.c.Levels, factors) + " (" + FlaggedTests(t.c.Checks, adjusted: true) + ")"));
        var more = flagged.Count > CellsNamed ? "; and " + NumberText.Count(flagged.Count - CellsNamed) + " more" : string.Empty;
        findings.Add("Residuals are not normal within " + NumberText.Count(flagged.Count) + " of " + NumberText.Count(testable)
            + " testable cell(s): " + named + more + ".");
        return true;
    }

    private static void NotTestableFindings(IReadOnlyList<CellResult> cells, SpreadResult spread, List<string> findings)
    {
        var untested = cells.Where(c => c.Checks[0].Status == CheckStatus.NotTestable).GroupBy(c => c.Checks[0].Reason)
            .Select(g => NumberText.Count(g.Count()) + " " + ReasonText(g.Key)).ToList();
        if (untested.Count > 0)
        {
            findings.Add("Within-cell normality could not be judged in " + string.Join(", ", untested) + ".");
        }

        if (spread.Status == CheckStatus.NotTestable)
        {
            findings.Add("Equal spread could not be judged: " + ReasonText(spread.Checks[0].Reason) + ".");
        }
    }

    private static string FlaggedTests(IEnumerable<CheckResult> checks, bool adjusted = false) =>
        string.Join(", ", checks.Where(c => c.Status == CheckStatus.Flag)
            .Select(c => c.Check + (adjusted && c.PAdjusted is not null ? " adjusted p " + NumberText.P(c.PAdjusted.Value) : " p " + NumberText.P(c.P ?? double.NaN))));

    private static string ReplicateText(Census census) => census.MinReplicates == census.MaxReplicates
        ? NumberText.Count(census.MinReplicates) + (census.MinReplicates == 1 ? " value" : " values")
        : NumberText.Count(census.MinReplicates) + " to " + NumberText.Count(census.MaxReplicates) + " values";

    /// <summary>Plain words for a reason code.</summary>
    public static string ReasonText(string? reason) => reason switch
    {
        NotTestableReason.TooFewValues => "cell(s) with fewer than 3 values",
        NotTestableReason.ZeroSpread => "cell(s) whose values are all equal",
        NotTestableReason.TooManyValues => "cell(s) above 5000 values",
        NotTestableReason.TooFewGroups => "fewer than two cells have two or more values",
        NotTestableReason.AllGroupsOfTwo => "every cell has exactly two values",
        NotTestableReason.ZeroVarianceGroup => "a cell has zero variance",
        NotTestableReason.DegenerateWithinGroups => "the deviations do not vary within cells",
        NotTestableReason.NoResidualDegreesOfFreedom => "no residual degrees of freedom",
        _ => reason ?? "unknown reason",
    };
}
