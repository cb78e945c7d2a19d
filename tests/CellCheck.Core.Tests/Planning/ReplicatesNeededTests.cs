using CellCheck.Core.Models;
using CellCheck.Core.Planning;
using CellCheck.Core.Tests.Statistics;

namespace CellCheck.Core.Tests.Planning;

public sealed class ReplicatesNeededTests
{
    [Theory]
    // R power.anova.test documentation: groups = 4, between.var = 1, within.var = 3, power = .80 -> n = 11.92613
    // (exact root 11.926111, shared reference); f² = 1 · 3/4 / 3 = 0.25.
    [InlineData(0.8, 11.926111, 12)]
    // R power.anova.test documentation: group means 120, 130, 140, 150, within.var = 500, power = .90 -> n = 15.18834
    // (exact root 15.188331); between.var = var(c(120, 130, 140, 150)) = 166.67, f² = 166.67 · 3/4 / 500 = 0.25.
    [InlineData(0.9, 15.188331, 16)]
    public void The_power_anova_test_sample_size_examples_are_reproduced(double target, double root, int whole)
    {
        var plan = ReplicatesNeeded.Plan(PlanningDesigns.OneWay(4), new ModelTerm([0]), SmallestEffect.CohenF(0.5), 1, 0.05, target, 5);
        // Tolerance 1e-6: the reference gives the root to six decimals.
        Close.Absolute(root, plan.ExactNeeded!.Value, 1e-6);
        Assert.Equal(whole, plan.Needed);
    }

    [Theory]
    [InlineData(new[] { 0 }, 0.3, 0.4, 0.8)]
    [InlineData(new[] { 0, 1 }, 0.3, 0.4, 0.8)]
    [InlineData(new[] { 0, 1, 2 }, 0.5, 0.4, 0.9)]
    [InlineData(new[] { 2 }, 0.05, 0.4, 0.8)]
    public void The_answer_reaches_the_target_and_one_replicate_fewer_does_not(int[] factors, double delta, double sd, double target)
    {
        var design = PlanningDesigns.Coating();
        var term = new ModelTerm(factors);
        var plan = ReplicatesNeeded.Plan(design, term, SmallestEffect.Difference(delta), sd, 0.05, target, 6);
        var n = plan.Needed!.Value;
        // recomputed from scratch at n and n − 1
        Assert.True(FactorialPower.Power(design, term, n, SmallestEffect.Difference(delta), sd, 0.05).Power >= target);
        Assert.True(n == design.MinimumReplicates || FactorialPower.Power(design, term, n - 1, SmallestEffect.Difference(delta), sd, 0.05).Power < target);
        Assert.Equal(n, plan.AtNeeded!.Replicates);
        Assert.InRange(plan.ExactNeeded!.Value, n - 1, n);
    }

    [Fact]
    public void The_coating_cure_temperature_answer_matches_r()
    {
        // R 4.2.2, beta series power (NoncentralFTests) for the linear cure_temp term of the 3 × 2 × 2 layout,
        // Δ = 0.2, σ = 0.4: λ(n) = n · 4 · 0.2² · 0.5 / 0.4² = n / 2, residual df 12n − 8;
        // sapply(2:20, function(n) up(qf(.95, 1, 12*n - 8), 1, 12*n - 8, n * 4 * 0.2^2 * 0.5 / 0.16)) gives
        // 0.7773674 at n = 15 and 0.8033573 at n = 16.
        var plan = ReplicatesNeeded.Plan(PlanningDesigns.Coating(), new ModelTerm([0]), SmallestEffect.Difference(0.2), 0.4, 0.05, 0.8, 6);
        Assert.Equal(16, plan.Needed);
        Close.Absolute(0.8033573, plan.AtNeeded!.Power, 1e-7);
        Close.Absolute(0.7773674, plan.BelowNeeded!.Power, 1e-7);
    }

    [Fact]
    public void A_target_out_of_reach_is_reported_not_looped_on()
    {
        var plan = ReplicatesNeeded.Plan(PlanningDesigns.OneWay(3), new ModelTerm([0]), SmallestEffect.CohenF(1e-6), 1, 0.05, 0.8, 2);
        Assert.Null(plan.Needed);
        Assert.Equal(ReplicatesNeeded.BeyondLimit, plan.Reason);
    }

    [Fact]
    public void The_smallest_design_with_a_residual_degree_of_freedom_is_the_floor_of_the_search()
    {
        // unreplicated 2 × 2 full factorial: n = 1 leaves no residual df, n = 2 leaves 4
        var design = new PlannedDesign([new PlannedFactor("a", 2), new PlannedFactor("b", 2)], ModelSpec.Full(2).Terms);
        Assert.Equal(2, design.MinimumReplicates);
        Assert.Equal(4.0, design.ResidualDf(2));
        var plan = ReplicatesNeeded.Plan(design, new ModelTerm([0]), SmallestEffect.Difference(50), 1, 0.05, 0.8, 1);
        Assert.Equal(2, plan.Needed);
        Assert.Null(plan.Current);
        Assert.Null(plan.BelowNeeded);
    }
}
