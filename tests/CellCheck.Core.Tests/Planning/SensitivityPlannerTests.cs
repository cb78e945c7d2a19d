using CellCheck.Core.Calibration;
using CellCheck.Core.Planning;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Planning;

public sealed class SensitivityPlannerTests
{
    [Fact]
    public void Each_answer_reaches_the_level_and_one_replicate_fewer_does_not()
    {
        const int Cells = 4, Draws = 100, Seed = 77;
        const double Target = 0.8;
        var needs = SensitivityPlanner.Plan(Cells, 0.05, AdjustMethod.Holm, Target, Draws, Seed);
        Assert.Equal(SensitivityChecks.All.Count, needs.Count);
        foreach (var (need, t) in needs.Select((x, i) => (x, i)))
        {
            if (need.Needed is not { } n)
            {
                Assert.Equal(SensitivityPlanner.BeyondLimit, need.Reason);
                continue;
            }

            // recomputed from scratch with the same seeded data sets, at n and n − 1
            RateEstimate? At(int size)
            {
                var plan = new CellMeansPlan(new DesignShape(Enumerable.Repeat(size, Cells)));
                var normality = need.Departure == Departure.Lognormal;
                return CheckSensitivity.Rates(plan, 0.05, AdjustMethod.Holm, need.Departure, Draws, Seed, normality, !normality).Rates[t];
            }

            Assert.True(At(n)!.Rate >= Target, $"{need.Check} {need.Scope} at {n}");
            Assert.True(At(n - 1) is not { } below || below.Rate < Target, $"{need.Check} {need.Scope} at {n - 1}");
            Assert.Equal(need.AtNeeded!.Rate, At(n)!.Rate);
        }
    }

    [Fact]
    public void More_clean_cells_dilute_one_lognormal_cell_so_the_pooled_check_needs_more_replicates()
    {
        // the pooled Shapiro-Wilk sees one lognormal cell among k; with more clean cells diluting it, it needs more
        // replicates per cell, not fewer: a sanity check on the direction of the search
        var two = SensitivityPlanner.Plan(2, 0.05, AdjustMethod.Holm, 0.8, 100, 5)[2].Needed;
        var eight = SensitivityPlanner.Plan(8, 0.05, AdjustMethod.Holm, 0.8, 100, 5)[2].Needed;
        Assert.NotNull(two);
        Assert.True(eight is null || eight > two, $"{two} vs {eight}");
    }
}
