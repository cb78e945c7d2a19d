namespace CellCheck.Core.Analysis;

/// <summary>Findings about the supporting tests: what they show, and that they do not drive the verdict.</summary>
internal static class SupportingText
{
    private const int CellsNamed = 3;

    public static void Add(VerdictInputs x, AssumptionVerdict normality, AssumptionVerdict spread, List<string> findings)
    {
        if (normality.Status != CheckStatus.Flag)
        {
            var cells = FlaggedCells(x);
            if (cells.Length > 0)
            {
                findings.Add("Supporting evidence only: within-cell tests flag " + cells + "; the primary normality check does not, "
                    + "so the response is not flagged for it. Look at those cells for outliers or recording errors.");
            }

            var pooled = FlaggedTests(x.Pooled.Checks);
            if (pooled.Length > 0)
            {
                findings.Add("Supporting evidence only: " + pooled + " on the pooled residuals (asymptotic p).");
            }
        }

        if (spread.Status != CheckStatus.Flag)
        {
            var tests = FlaggedTests(x.Spread.Checks);
            if (tests.Length > 0)
            {
                findings.Add("Supporting evidence only: " + tests + " suggest unequal spread" + SdRatio(x) + "; the primary check does not. "
                    + "Mean-centred Levene is liberal with small cells and Bartlett reacts to non-normal tails.");
            }
        }
    }

    public static string CellsThatStandOut(VerdictInputs x)
    {
        var cells = FlaggedCells(x);
        return cells.Length == 0 ? string.Empty : " Cells that stand out in within-cell tests: " + cells + ".";
    }

    public static string SdRatio(VerdictInputs x)
    {
        var s = x.Spread;
        return s.SdRatio is { } ratio && s.LargestSdCell is { } hi && s.SmallestSdCell is { } lo
            ? "; the largest cell SD is " + NumberText.Fixed(ratio, 1) + " times the smallest (" + CellText.Describe(x.Cells[hi].Levels, x.Factors)
                + " against " + CellText.Describe(x.Cells[lo].Levels, x.Factors) + ")"
            : string.Empty;
    }

    private static string FlaggedCells(VerdictInputs x)
    {
        var flagged = x.Cells.Where(c => c.Status == CheckStatus.Flag).OrderBy(c => c.Checks.Min(k => k.PAdjusted ?? 1.0)).ToList();
        if (flagged.Count == 0)
        {
            return string.Empty;
        }

        var named = string.Join("; ", flagged.Take(CellsNamed).Select(c => CellText.Describe(c.Levels, x.Factors) + " ("
            + FlaggedTests(c.Checks, adjusted: true) + ")"));
        return named + (flagged.Count > CellsNamed ? "; and " + NumberText.Count(flagged.Count - CellsNamed) + " more" : string.Empty);
    }

    private static string FlaggedTests(IEnumerable<CheckResult> checks, bool adjusted = false) =>
        string.Join(", ", checks.Where(c => c.Status == CheckStatus.Flag)
            .Select(c => c.Check + (adjusted && c.PAdjusted is not null ? " adjusted p " + NumberText.P(c.PAdjusted.Value) : " p " + NumberText.P(c.P ?? double.NaN))));
}
