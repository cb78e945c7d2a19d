using System.Globalization;
using CellCheck.Core.Calibration;

namespace CellCheck.IO.Reports;

/// <summary>Writes the calibration grid as a Markdown table with the settings that produced it.</summary>
public static class CalibrationTableWriter
{
    public static void Write(IReadOnlyList<GridRow> rows, double alpha, CalibrationSettings settings, string toolVersion, TextWriter w)
    {
        ArgumentNullException.ThrowIfNull(rows);
        ArgumentNullException.ThrowIfNull(settings);
        ArgumentNullException.ThrowIfNull(w);
        w.WriteLine("# Calibration of the verdict");
        w.WriteLine();
        w.WriteLine(Invariant($"Produced by `cellcheck calibrate` (CellCheck {toolVersion}): alpha {alpha}, {settings.NullDraws} null draws per design ")
            + Invariant($"for the Monte Carlo p-values, {settings.ScenarioDraws} simulated data sets per scenario, seed {settings.Seed}."));
        w.WriteLine();
        w.WriteLine("Clean data: normal errors with equal spread. Departures, each in one cell, the cell taken in turn across draws: variance four times the "
            + "others' (SD ratio 2), or lognormal errors with shape 0.5 standardised to the same mean and variance. The verdict flags a "
            + "response when Holm's adjustment across the primary normality and spread checks leaves a p-value below alpha. "
            + "\"Best single\" is the most powerful of the nine candidate tests, each at the same exact size (calibrated by its own "
            + "simulated null distribution), so the comparison is fair; \"best robust single\" is the best spread test among those that "
            + "flag heavy-tailed data of equal spread (t with 5 df in every cell) at most twice alpha. The last column is how often the "
            + "verdict calls heavy tails unequal spread. Rates in percent with Wilson 95% intervals. Bound: alpha + 2 "
            + "binomial standard errors at this number of data sets. The designs are listed without a run order. With one, the verdict "
            + "adds Durbin-Watson's exact p to the same Holm family: the false-alarm rate stays at or below alpha (Holm holds under any "
            + "dependence; the exact p makes the third test exact under the null) and power can only fall slightly. Not simulated here: "
            + "the exact p needs the eigenvalues of each design in its run order for every draw.");
        w.WriteLine();
        w.WriteLine("| design | spread primary | false alarm % | within bound | 4:1 variance: verdict % | best single % | best robust single % | lognormal cell: verdict % | best single % | heavy tails: verdict flags spread % |");
        w.WriteLine("| --- | --- | --- | --- | --- | --- | --- | --- | --- | --- |");
        var bound = alpha + (2 * Math.Sqrt(alpha * (1 - alpha) / settings.ScenarioDraws));
        foreach (var r in rows)
        {
            var spread = SpreadName(r.Choice.Spread);
            w.WriteLine(Invariant($"| {r.Design.Label} | {spread} | {Rate(r.FalseAlarm)} | {(r.FalseAlarm.Rate <= bound ? "yes" : "NO")} | ")
                + Invariant($"{Rate(r.VarianceRatio4)} | {Pct(r.BestVariance.Rate)} ({r.BestVarianceTest}) | {BestRobust(r, alpha)} | {Rate(r.Lognormal)} | {Pct(r.BestLognormal.Rate)} ({r.BestLognormalTest}) | {Pct(r.HeavyTailSpreadFlag.Rate)} |"));
        }

        var worst = rows.Max(r => r.FalseAlarm.Rate);
        var within = rows.Count(r => r.FalseAlarm.Rate <= bound);
        var gap = rows.Max(r => Math.Max(r.BestVariance.Rate - r.VarianceRatio4.Rate, r.BestLognormal.Rate - r.Lognormal.Rate));
        w.WriteLine();
        w.WriteLine(Invariant($"Summary: {within} of {rows.Count} designs within the bound of {Pct(bound)}%; highest false-alarm rate {Pct(worst)}%; ")
            + Invariant($"largest power shortfall against the best single test {Pct(gap)} points."));
        CandidateTable(w, "Every candidate test, 4:1 variance ratio in one cell: % flagged", rows, r => r.CandidateVariance);
        CandidateTable(w, "Every candidate test, lognormal cell: % flagged", rows, r => r.CandidateLognormal);
        CandidateTable(w, "Every candidate test, heavy tails everywhere with equal spread: % flagged (a spread test should stay near alpha)", rows, r => r.CandidateHeavyTails);
    }

    /// <summary>The most powerful spread test (against the 4:1 variance ratio) among those that flag heavy-tailed data
    /// with equal spread at most twice alpha: a test that mistakes tails for spread is no fair benchmark.</summary>
    private static string BestRobust(GridRow r, double alpha)
    {
        var best = -1;
        for (var t = 3; t < CandidateTests.Names.Count; t++)
        {
            if (r.CandidateHeavyTails[t].Rate <= 2 * alpha && (best < 0 || r.CandidateVariance[t].Hits > r.CandidateVariance[best].Hits))
            {
                best = t;
            }
        }

        return best < 0 ? "none" : Invariant($"{Pct(r.CandidateVariance[best].Rate)} ({CandidateTests.Names[best]})");
    }

    private static string SpreadName(SpreadPrimary s) => s switch
    {
        SpreadPrimary.Bartlett => "bartlett",
        SpreadPrimary.BrownForsythe => "brown-forsythe",
        _ => "brown-forsythe-zeros-removed",
    };

    private static void CandidateTable(TextWriter w, string title, IReadOnlyList<GridRow> rows, Func<GridRow, IReadOnlyList<RateEstimate>> rates)
    {
        w.WriteLine();
        w.WriteLine("## " + title);
        w.WriteLine();
        w.WriteLine("| design | " + string.Join(" | ", CandidateTests.Names) + " |");
        w.WriteLine("| --- |" + string.Concat(Enumerable.Repeat(" --- |", CandidateTests.Names.Count)));
        foreach (var r in rows)
        {
            w.WriteLine("| " + r.Design.Label + " | " + string.Join(" | ", rates(r).Select(x => Pct(x.Rate))) + " |");
        }
    }

    private static string Rate(RateEstimate r) => Invariant($"{Pct(r.Rate)} [{Pct(r.Lower)}, {Pct(r.Upper)}]");

    private static string Pct(double rate) => (100 * rate).ToString("F1", CultureInfo.InvariantCulture);

    private static string Invariant(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
