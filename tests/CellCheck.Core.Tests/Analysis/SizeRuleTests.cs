using CellCheck.Core.Analysis;
using CellCheck.Core.Data;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Analysis;

/// <summary>The size rules of the checks: what is not testable, and why (common practice, no source, unless named).</summary>
public sealed class SizeRuleTests
{
    internal static ResponseReport Analyze(int[] cellOfRow, double[] values, int cells, AdjustMethod adjust = AdjustMethod.Holm)
    {
        var levels = Enumerable.Range(0, cells).Select(i => "c" + i.ToString(System.Globalization.CultureInfo.InvariantCulture)).ToArray();
        var data = new DesignData(
            [new FactorColumn("cell", levels, cellOfRow)],
            [new ResponseColumn("y", null, 0, values)],
            Enumerable.Range(2, values.Length).ToArray(),
            [Array.Empty<ExcludedRow>()]);
        return ResponseAnalyzer.Analyze(data, 0, new AnalysisOptions(0.05, adjust));
    }

    private static CheckResult Check(IEnumerable<CheckResult> checks, string name) => checks.Single(c => c.Check == name);

    [Fact]
    public void A_cell_with_fewer_than_three_values_is_not_testable_for_normality()
    {
        var r = Analyze([0, 0, 1, 1, 1], [1, 2, 1, 2, 4], 2);
        var sw = Check(r.Cells[0].Checks, CheckNames.ShapiroWilk);
        Assert.Equal((CheckStatus.NotTestable, NotTestableReason.TooFewValues), (sw.Status, sw.Reason));
        Assert.Null(sw.P);
        Assert.Equal(CheckStatus.Pass, Check(r.Cells[1].Checks, CheckNames.ShapiroWilk).Status);
    }

    [Fact]
    public void A_cell_of_constant_values_is_not_testable_and_bartlett_says_so_instead_of_infinity()
    {
        var r = Analyze([0, 0, 0, 1, 1, 1, 2, 2, 2], [1, 1, 1, 1, 2, 3, 2, 4, 7], 3);
        Assert.Equal(NotTestableReason.ZeroSpread, Check(r.Cells[0].Checks, CheckNames.ShapiroWilk).Reason);
        var bartlett = Check(r.Spread.Checks, CheckNames.Bartlett);
        Assert.Equal((CheckStatus.NotTestable, NotTestableReason.ZeroVarianceGroup), (bartlett.Status, bartlett.Reason));
        // R 4.2.2 car-free: Brown-Forsythe F on |y - median| for {1,1,1},{1,2,3},{2,4,7} = 2.375 (shared reference README)
        Assert.Equal(2.375, Check(r.Spread.Checks, CheckNames.BrownForsythe).Statistic!.Value, 1e-12);
        Assert.Null(r.Spread.SdRatio);
    }

    [Fact]
    public void Cells_of_two_make_levene_and_brown_forsythe_degenerate_not_p_near_zero()
    {
        var r = Analyze([0, 0, 1, 1, 2, 2], [1, 2, 5, 9, 3, 3.5], 3);
        foreach (var name in new[] { CheckNames.Levene, CheckNames.BrownForsythe })
        {
            var c = Check(r.Spread.Checks, name);
            Assert.Equal((CheckStatus.NotTestable, NotTestableReason.AllGroupsOfTwo), (c.Status, c.Reason));
        }

        Assert.Contains(r.Spread.Notes, n => n.Contains("two values", StringComparison.Ordinal));
    }

    [Fact]
    public void A_single_cell_cannot_be_compared_for_spread()
    {
        var r = Analyze([0, 0, 0, 0], [1, 2, 4, 3], 1);
        Assert.All(r.Spread.Checks, c => Assert.Equal(NotTestableReason.TooFewGroups, c.Reason));
        Assert.Equal(CheckStatus.NotTestable, r.Spread.Status);
    }

    [Fact]
    public void Only_singleton_cells_leave_no_residual_degrees_of_freedom()
    {
        var r = Analyze([0, 1, 2], [1, 2, 4], 3);
        Assert.All(r.Pooled.Checks, c => Assert.Equal(NotTestableReason.NoResidualDegreesOfFreedom, c.Reason));
        Assert.Equal(CheckStatus.NotTestable, r.Verdict.Status);
    }

    [Fact]
    public void Anderson_darling_needs_eight_values()
    {
        var r = Analyze([0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 1, 1], [1, 2, 3, 4, 5, 6, 8, 1, 2, 3, 4, 5, 6, 7, 9], 2);
        Assert.Equal(NotTestableReason.TooFewValues, Check(r.Cells[0].Checks, CheckNames.AndersonDarling).Reason);
        Assert.NotEqual(CheckStatus.NotTestable, Check(r.Cells[1].Checks, CheckNames.AndersonDarling).Status);
    }

    [Fact]
    public void Cell_p_values_are_adjusted_across_the_testable_cells_by_holm()
    {
        var rows = new[] { 0, 0, 0, 0, 1, 1, 1, 1, 2, 2 };
        var r = Analyze(rows, [1, 2, 3, 10, 1, 2, 4, 5, 1, 2], 3);
        var p = r.Cells.Take(2).Select(c => Check(c.Checks, CheckNames.ShapiroWilk)).ToArray();
        // Holm (1979) with two tests: the smaller p doubles, the larger is max(2 p_min, p_max), capped at 1.
        var (lo, hi) = p[0].P < p[1].P ? (p[0], p[1]) : (p[1], p[0]);
        Assert.Equal(Math.Min(1, 2 * lo.P!.Value), lo.PAdjusted!.Value, 1e-15);
        Assert.Equal(Math.Min(1, Math.Max(2 * lo.P!.Value, hi.P!.Value)), hi.PAdjusted!.Value, 1e-15);
        Assert.Null(Check(r.Cells[2].Checks, CheckNames.ShapiroWilk).PAdjusted);
    }

    [Fact]
    public void Above_five_thousand_pooled_residuals_shapiro_wilk_keeps_w_without_p_and_says_why()
    {
        // Royston's approximation is valid for n <= 5000 (Royston 1995, AS R94); never subsample silently.
        const int n = 6000;
        var cells = new int[n];
        var values = new double[n];
        for (var i = 0; i < n; i++)
        {
            cells[i] = i % 3;
            values[i] = Math.Sin(i * 0.7) + (0.001 * (i % 17));
        }

        var r = Analyze(cells, values, 3);
        var sw = Check(r.Pooled.Checks, CheckNames.ShapiroWilk);
        Assert.Equal((CheckStatus.NotTestable, NotTestableReason.TooManyValues), (sw.Status, sw.Reason));
        Assert.NotNull(sw.Statistic);
        Assert.Null(sw.P);
        Assert.Contains(r.Pooled.Notes, note => note.Contains("5000", StringComparison.Ordinal));
        Assert.NotEqual(CheckStatus.NotTestable, Check(r.Pooled.Checks, CheckNames.AndersonDarling).Status);
    }
}
