using CellCheck.Core.Analysis;

namespace CellCheck.IO.Tests.Hostile;

/// <summary>What every report must satisfy whatever the data: each p-value, raw or adjusted, is in [0, 1] or absent,
/// and each statistic reported is a finite number or absent (a verdict never rests on NaN or infinity).</summary>
internal static class ReportInvariants
{
    public static void Check(CheckReport report)
    {
        foreach (var r in report.Responses)
        {
            var checks = r.Cells.SelectMany(c => c.Checks).Concat(r.Pooled.Checks).Concat(r.Spread.Checks)
                .Concat(r.Model.Checks).Concat(r.Order.Checks).Concat(r.Order.ByBlock.SelectMany(b => b.Checks));
            foreach (var c in checks)
            {
                Probability(c.P, $"{r.Response} {c.Check} p");
                Probability(c.PAdjusted, $"{r.Response} {c.Check} adjusted p");
            }

            foreach (var a in r.Verdict.Assumptions)
            {
                Probability(a.P, $"{r.Response} {a.Assumption} primary p");
                Probability(a.PAdjusted, $"{r.Response} {a.Assumption} primary adjusted p");
                Assert.True(a.Statistic is null || double.IsFinite(a.Statistic.Value), $"{r.Response} {a.Assumption} statistic is {a.Statistic}");
            }
        }
    }

    private static void Probability(double? p, string what) =>
        Assert.True(p is null || (p >= 0 && p <= 1), $"{what} is {p}, outside [0, 1]");
}
