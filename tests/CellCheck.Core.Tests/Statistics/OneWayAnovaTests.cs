using CellCheck.Core.Statistics;
using CellCheck.Core.Tests.Support;

namespace CellCheck.Core.Tests.Statistics;

public sealed class OneWayAnovaTests
{
    // R fits by QR least squares and we by closed-form sums; both are accurate to rounding (observed ≤ 1e-14 relative).
    private const double RTolerance = 1e-12;

    // The project's target for p-values from MathNet distributions against a full-precision reference (observed ≤ 2e-13).
    private const double PTolerance = 1e-9;

    [Fact]
    public void Plant_growth_table_matches_R()
    {
        // R 4.2.2 anova(lm(weight ~ group, PlantGrowth)) (Fixtures/check-values.R)
        var t = OneWayAnova.Compute(SpreadData.Load("plant-growth"));

        Accuracy.AssertRelative(3.7663399999999987, t.SsBetween, RTolerance, "SS between");
        Accuracy.AssertRelative(10.492089999999997, t.SsWithin, RTolerance, "SS within");
        Assert.Equal(2, t.DfBetween);
        Assert.Equal(27, t.DfWithin);
        Accuracy.AssertRelative(4.8460878623801351, t.F, RTolerance, "F");
        Accuracy.AssertRelative(0.015909958325622937, t.P, PTolerance, "p");
        Accuracy.AssertRelative(3.7663399999999987 / (3.7663399999999987 + 10.492089999999997), t.RSquared, RTolerance, "R²");
        Accuracy.AssertRelative(Math.Sqrt(10.492089999999997 / 27), t.ResidualSd, RTolerance, "residual SD");
    }

    [Fact]
    public void Insect_sprays_far_tail_p_keeps_its_precision()
    {
        // R 4.2.2 anova(lm(count ~ spray, InsectSprays)): F 34.702282055491686, p 3.1825837261451847e-17
        var t = OneWayAnova.Compute(SpreadData.Load("insect-sprays"));

        Accuracy.AssertRelative(34.702282055491686, t.F, RTolerance, "F");
        Accuracy.AssertRelative(3.1825837261451847e-17, t.P, PTolerance, "p");
    }

    [Fact]
    public void A_group_of_one_counts_and_an_empty_group_does_not()
    {
        // R 4.2.2 anova(lm(y ~ g)) on PlantGrowth plus a group {5.0}: df 3 and 27
        var t = OneWayAnova.Compute(SpreadData.WithSingletonAndEmpty(SpreadData.Load("plant-growth"), 5.0));

        Assert.Equal(3, t.DfBetween);
        Assert.Equal(27, t.DfWithin);
        Accuracy.AssertRelative(3.7714970967741936, t.SsBetween, RTolerance, "SS between");
        Accuracy.AssertRelative(3.2351489427719127, t.F, RTolerance, "F");
        Accuracy.AssertRelative(0.037764331404127001, t.P, PTolerance, "p");
    }

    [Fact]
    public void Zero_within_variation_with_distinct_means_gives_infinite_F_and_p_zero()
    {
        // definition: MS within 0, MS between > 0
        var t = OneWayAnova.Compute(GroupedValues.FromGroups([[1.0, 1.0], [2.0, 2.0]]));

        Assert.Equal(double.PositiveInfinity, t.F);
        Assert.Equal(0.0, t.P);
        Assert.Equal(1.0, t.RSquared);
    }

    [Fact]
    public void Identical_values_give_undefined_F()
    {
        var t = OneWayAnova.Compute(GroupedValues.FromGroups([[3.0, 3.0], [3.0, 3.0, 3.0]]));

        Assert.True(double.IsNaN(t.F));
        Assert.True(double.IsNaN(t.P));
        Assert.True(double.IsNaN(t.RSquared));
    }

    [Fact]
    public void A_single_group_has_no_between_degrees_of_freedom()
    {
        var t = OneWayAnova.Compute(GroupedValues.FromGroups([[1.0, 2.0, 4.0], []]));

        Assert.Equal(0, t.DfBetween);
        Assert.Equal(2, t.DfWithin);
        Assert.True(double.IsNaN(t.F));
    }
}
