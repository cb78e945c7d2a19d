using CellCheck.Core.Analysis;

namespace CellCheck.Core.Remedies;

/// <summary>
/// Lines up the statuses and key p-values of a response before and after a transformation: the verdict, each
/// assumption's primary check, the pooled Shapiro-Wilk test, the spread tests and Tukey's non-additivity test.
/// </summary>
public static class RemedyComparison
{
    private static readonly string[] SpreadChecks =
        [CheckNames.BrownForsythe, CheckNames.Levene, CheckNames.Bartlett, CheckNames.FlignerKilleen];

    public static IReadOnlyList<ComparisonRow> Build(ResponseReport before, ResponseReport after)
    {
        ArgumentNullException.ThrowIfNull(before);
        ArgumentNullException.ThrowIfNull(after);
        var rows = new List<ComparisonRow>
        {
            new("verdict", null, new ComparisonSide(null, null, before.Verdict.Status), new ComparisonSide(null, null, after.Verdict.Status)),
        };
        foreach (var a in before.Verdict.Assumptions)
        {
            var b = after.Verdict.Assumptions.FirstOrDefault(x => x.Assumption == a.Assumption);
            if (b is not null && (a.Status != CheckStatus.NotTestable || b.Status != CheckStatus.NotTestable))
            {
                rows.Add(new ComparisonRow(a.Assumption, a.Check, Side(a), Side(b)));
            }
        }

        Add(rows, "pooled", before.Pooled.Checks, after.Pooled.Checks, [CheckNames.ShapiroWilk]);
        Add(rows, "spread", before.Spread.Checks, after.Spread.Checks, SpreadChecks);
        Add(rows, "model", before.Model.Checks, after.Model.Checks, [CheckNames.TukeyNonadditivity]);
        return rows;
    }

    private static ComparisonSide Side(AssumptionVerdict a) => new(a.P, a.PAdjusted, a.Status);

    private static void Add(List<ComparisonRow> rows, string item, IReadOnlyList<CheckResult> before, IReadOnlyList<CheckResult> after, IEnumerable<string> names)
    {
        foreach (var name in names)
        {
            var b = before.FirstOrDefault(c => c.Check == name);
            var a = after.FirstOrDefault(c => c.Check == name);
            if (b is not null && a is not null && (b.Status != CheckStatus.NotTestable || a.Status != CheckStatus.NotTestable))
            {
                rows.Add(new ComparisonRow(item, name, new ComparisonSide(b.P, b.PAdjusted, b.Status), new ComparisonSide(a.P, a.PAdjusted, a.Status)));
            }
        }
    }
}
