using CellCheck.Core.Models;
using CellCheck.Core.Planning;
using CellCheck.Core.Tests.Statistics;

namespace CellCheck.Core.Tests.Planning;

public sealed class FactorialPowerTests
{
    private static readonly ModelTerm Group = new([0]);

    [Fact]
    public void The_first_power_anova_test_example_is_reproduced()
    {
        // R power.anova.test documentation: groups = 4, n = 5, between.var = 1, within.var = 3 -> power = 0.3535594
        // (full precision 0.353559423815302, R 4.2.2). Cohen's f² = between.var (k − 1)/k / within.var = 0.25, so
        // λ = f² N = 5. Tolerance 1e-9 absolute: R's pf with ncp is good to its errmax 1e-9 (NoncentralFTests).
        var p = FactorialPower.Power(PlanningDesigns.OneWay(4), Group, 5, SmallestEffect.CohenF(0.5), 1, 0.05);
        Assert.Equal((3, 16.0), (p.Df1, p.Df2));
        Close.Relative(5, p.Lambda, 1e-15);
        Close.Absolute(0.353559423815302, p.Power, 1e-9);
    }

    [Fact]
    public void Cohens_exercise_with_f_0_28_and_four_groups_of_twenty_is_reproduced()
    {
        // Cohen (1988) exercise 8.1: f = 0.28, k = 4, n = 20; power 0.514979292197 (R 4.2.2, shared reference;
        // Cohen's table about 0.51). λ = 0.28² · 80 = 6.272. Tolerance as above (R's errmax).
        var p = FactorialPower.Power(PlanningDesigns.OneWay(4), Group, 20, SmallestEffect.CohenF(0.28), 1, 0.05);
        Close.Relative(6.272, p.Lambda, 1e-14);
        Close.Absolute(0.514979292197, p.Power, 1e-9);
    }

    // Noncentrality checked against R's sums of squares: noise-free data y equal to the least favourable cell means
    // (Δ = 0.5, σ = 0.4, 6 replicates), anova(lm(y ~ T*S*P, d))[term, "Sum Sq"] / 0.4^2 with T numeric 160, 180, 200 and
    // S, P two-level factors; power by the beta series in R (NoncentralFTests) at qf(.95, 1, 64). Script: R 4.2.2,
    // d <- expand.grid(T = c(160,180,200), S = factor(1:2), P = factor(1:2), r = 1:6); uT <- (d$T - 180)/40;
    // uS <- c(.5,-.5)[d$S]; uP <- c(.5,-.5)[d$P]; y = 0.5 * (the product of the term's u). Tolerances: λ 1e-12 relative
    // (R's sums of squares from a QR fit), power 1e-11 relative (series agreement, NoncentralFTests).
    [Theory]
    [InlineData(new[] { 0 }, 18.75, 0.989398122754394)]
    [InlineData(new[] { 1 }, 28.125, 0.999447493028613)]
    [InlineData(new[] { 0, 1 }, 4.6875, 0.568514695881532)]
    [InlineData(new[] { 1, 2 }, 7.03125, 0.742708842488757)]
    [InlineData(new[] { 0, 1, 2 }, 1.171875, 0.186998735707796)]
    public void The_coating_layout_with_a_numeric_factor_matches_r_sums_of_squares(int[] factors, double lambda, double power)
    {
        var p = FactorialPower.Power(PlanningDesigns.Coating(), new ModelTerm(factors), 6, SmallestEffect.Difference(0.5), 0.4, 0.05);
        Assert.Equal((1, 64.0), (p.Df1, p.Df2));
        Close.Relative(lambda, p.Lambda, 1e-12);
        Close.Relative(power, p.Power, 1e-11);
    }

    // Categorical 3 × 2 × 2 with 4 replicates, Δ = 1, σ = 1: R 4.2.2 anova(lm(y ~ A*B*C, d)) sums of squares of the least
    // favourable means (the difference of differences of the A:B means is 1, of the A:B:C means 1), powers by the
    // series at qf(.95, 2, 36). λ halves with each factor the difference is spread over: 8, 2, 0.5.
    [Theory]
    [InlineData(new[] { 0 }, 8, 0.678548502244868)]
    [InlineData(new[] { 0, 1 }, 2, 0.210416192356871)]
    [InlineData(new[] { 0, 1, 2 }, 0.5, 0.0863149184533981)]
    public void Interactions_take_the_least_favourable_difference_of_differences(int[] factors, double lambda, double power)
    {
        var p = FactorialPower.Power(PlanningDesigns.ThreeByTwoByTwo(), new ModelTerm(factors), 4, SmallestEffect.Difference(1), 1, 0.05);
        Assert.Equal((2, 36.0), (p.Df1, p.Df2));
        Close.Relative(lambda, p.Lambda, 1e-12);
        Close.Relative(power, p.Power, 1e-11);
    }

    [Fact]
    public void A_main_effects_model_keeps_the_interaction_df_as_residual()
    {
        // R 4.2.2: anova(lm(y ~ A + B + C, d)) for 3 × 2 × 2 with 3 replicates: A has 2 df, residuals 31, SS 6 for Δ = 1;
        // power 0.540382374568238 by the series. Tolerances as above.
        var design = PlanningDesigns.ThreeByTwoByTwo() with { Terms = ModelSpec.Main(3).Terms };
        var p = FactorialPower.Power(design, new ModelTerm([0]), 3, SmallestEffect.Difference(1), 1, 0.05);
        Assert.Equal((2, 31.0), (p.Df1, p.Df2));
        Close.Relative(6, p.Lambda, 1e-12);
        Close.Relative(0.540382374568238, p.Power, 1e-11);
    }

    [Fact]
    public void Blocks_as_complete_replicates_take_their_degrees_of_freedom_from_the_residual()
    {
        // The field trial's layout: nitrogen 3 × variety 2 in 4 complete blocks. R 4.2.2 anova(lm(y ~ block + N*V, d)):
        // N 2 df, residuals 15, SS / 0.25² = 5.76 for Δ = 0.3; power 0.478615553896567 by the series. Tolerances as above.
        var design = new PlannedDesign([new PlannedFactor("nitrogen", 3), new PlannedFactor("variety", 2)], ModelSpec.Full(2).Terms, Blocked: true);
        var p = FactorialPower.Power(design, new ModelTerm([0]), 4, SmallestEffect.Difference(0.3), 0.25, 0.05);
        Assert.Equal((2, 15.0), (p.Df1, p.Df2));
        Close.Relative(5.76, p.Lambda, 1e-12);
        Close.Relative(0.478615553896567, p.Power, 1e-11);
    }
}
