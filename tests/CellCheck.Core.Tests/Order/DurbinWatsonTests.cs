using CellCheck.Core.Order;
using CellCheck.Core.Statistics;
using CellCheck.Core.Tests.Statistics;

namespace CellCheck.Core.Tests.Order;

public sealed class DurbinWatsonTests
{
    // Check values marked "R" come from Fixtures/order-check-values.R (R 4.2.2, base stats): eigenvalues from eigen()
    // and P(d ≤ d0) by two independent adaptive integrations (Imhof's integral and the real-axis form), which agree
    // within 2e-16. Our integration bounds its own error by 1e-10 (typically ~1e-12), hence 1e-10 absolute.
    private const double ExactTolerance = 1e-10;

    [Fact]
    public void Growth_of_money_statistic_and_exact_p_match_the_reference()
    {
        var (x, y) = OrderFixtures.GrowthOfMoney();
        var e = OrderFixtures.Residuals(x, y);

        var positive = DurbinWatson.Test(e, x);
        var twoSided = DurbinWatson.Test(e, x, DurbinWatsonAlternative.TwoSided);

        // d: closed form; the reference (lmtest::dwtest, reference README) is printed to 13 digits, and the residuals
        // of a 2-column least-squares fit agree with R's to about 1e-15, so 1e-11 relative covers the printing.
        Close.Relative(2.904606519896, positive.D, 1e-11);
        // exact p: lmtest::dwtest(exact = TRUE) 0.983870195136, two-sided 0.0322596097281 (reference README, 12
        // digits); 1e-7 absolute is the accuracy asked of the exact distribution (observed 1e-13).
        Close.Absolute(0.983870195136, positive.P, 1e-7);
        Close.Absolute(0.0322596097281, twoSided.P, 1e-7);
        // R: 0.98387019513594343 (Imhof) and 0.98387019513594332 (real-axis form)
        Close.Absolute(0.98387019513594343, positive.P, ExactTolerance);
        Assert.Equal(OrderMethods.Exact, positive.Method);
        Assert.Equal(DurbinWatsonAlternative.TwoSided, twoSided.Alternative);
    }

    [Fact]
    public void Growth_of_money_normal_approximation_matches_the_reference()
    {
        var (x, y) = OrderFixtures.GrowthOfMoney();
        var e = OrderFixtures.Residuals(x, y);

        var approximate = DurbinWatson.Test(e, x, DurbinWatsonAlternative.Positive, exactLimit: 0);

        // lmtest::dwtest(exact = FALSE) 0.982444370803 (reference README, 12 digits): 1e-9 relative.
        Close.Relative(0.982444370803, approximate.P, 1e-9);
        Assert.Equal(OrderMethods.NormalApproximation, approximate.Method);
        // R: mean(lambda) 1.9825503321636355 and 2(m Σλ² − (Σλ)²)/(m²(m + 2)) 0.19149420594171165 from the
        // eigenvalues; our traces take another summation path, so agreement to rounding (1e-12 relative).
        Close.Relative(1.9825503321636355, approximate.ExpectedD, 1e-12);
        Close.Relative(0.19149420594171165, approximate.VarianceD, 1e-12);
    }

    [Fact]
    public void Statsmodels_sample_taken_as_residuals_gives_the_published_statistic()
    {
        // statsmodels test_durbin_watson, from R car (reference README): d = 1.95298958377419; closed form, so the
        // 15 printed digits are checked to 1e-13 relative.
        Close.Relative(1.95298958377419, DurbinWatson.Statistic(ReferenceSamples.Statsmodels20), 1e-13);

        // The same values as residuals of an empty model (M = I): R gives P(d ≤ d_obs) 0.55060689730885959 (Imhof)
        // and 0.5506068973088607 (real-axis form), and E[d] = tr(A)/n = 2(n − 1)/n = 1.9 exactly.
        var result = DurbinWatson.Test(ReferenceSamples.Statsmodels20, new double[20, 0]);
        Close.Relative(1.95298958377419, result.D, 1e-13);
        Close.Absolute(0.55060689730885959, result.P, ExactTolerance);
        Close.Relative(1.9, result.ExpectedD, 1e-14);
        Close.Relative(0.18090909090909074, result.VarianceD, 1e-12); // R, from the eigenvalues; rounding only
    }

    [Theory]
    // R (Fixtures/order-check-values.R), 2⁴ factorial in a scrambled run order, columns 1 A B C D
    [InlineData(1.5, 0.23496187183531192)]
    [InlineData(2.0, 0.60817641385039334)]
    [InlineData(2.5, 0.90137030693831033)]
    [InlineData(3.0, 0.99180553340468935)]
    public void Exact_distribution_for_a_small_factorial_matches_R(double d0, double expected)
    {
        var distribution = new DurbinWatsonDistribution(ProjectedDifference.FromDesign(OrderFixtures.Factorial16()));

        var (probability, errorBound) = distribution.ExactCdf(d0);

        Close.Absolute(expected, probability, ExactTolerance);
        Assert.True(errorBound < 1e-10, $"error bound {errorBound:E2}");
    }

    [Fact]
    public void Moments_for_a_small_factorial_match_R_and_the_eigenvalues()
    {
        var design = ProjectedDifference.FromDesign(OrderFixtures.Factorial16());
        var distribution = new DurbinWatsonDistribution(design);
        var lambda = distribution.Eigenvalues();

        // R: E[d] 1.8636363636363649, Var[d] 0.23490146217418931 from the eigenvalues (rounding only: 1e-12)
        Close.Relative(1.8636363636363649, distribution.Mean, 1e-12);
        Close.Relative(0.23490146217418931, distribution.Variance, 1e-12);
        Assert.Equal(11, lambda.Length);
        // the traces equal the eigenvalue sums (definition); the eigenvalues are accurate to ~1e-15 each
        Close.Relative(design.TraceMA, lambda.Sum(), 1e-13);
        Close.Relative(design.TraceMASquared, lambda.Sum(l => l * l), 1e-13);
    }

    [Fact]
    public void Negative_and_two_sided_p_follow_from_the_lower_tail()
    {
        var (x, y) = OrderFixtures.GrowthOfMoney();
        var e = OrderFixtures.Residuals(x, y);

        var positive = DurbinWatson.Test(e, x, DurbinWatsonAlternative.Positive).P;
        var negative = DurbinWatson.Test(e, x, DurbinWatsonAlternative.Negative).P;
        var twoSided = DurbinWatson.Test(e, x, DurbinWatsonAlternative.TwoSided).P;

        // definitions: P(d ≥ d_obs) = 1 − P(d ≤ d_obs) for a continuous d; two-sided = 2 min(·, ·); rounding only
        Close.Absolute(1 - positive, negative, 1e-15);
        Close.Absolute(2 * Math.Min(positive, negative), twoSided, 1e-15);
    }

    [Fact]
    public void Too_few_residuals_for_the_design_are_not_testable()
    {
        var x = new double[4, 3] { { 1, 0, 1 }, { 1, 1, 0 }, { 1, 0, 0 }, { 1, 1, 1 } };

        var result = DurbinWatson.Test([0.1, -0.2, 0.3, -0.2], x);

        Assert.Equal(NotTestableReason.TooFewValues, result.Reason);
        Assert.False(result.IsTestable);
        Assert.True(double.IsNaN(result.D) && double.IsNaN(result.P));
    }

    [Fact]
    public void All_zero_residuals_are_not_testable_but_keep_the_design_moments()
    {
        var (x, _) = OrderFixtures.GrowthOfMoney();

        var result = DurbinWatson.Test(new double[19], x);

        Assert.Equal(NotTestableReason.ZeroSpread, result.Reason);
        Assert.Equal(OrderMethods.None, result.Method);
        Close.Relative(1.9825503321636355, result.ExpectedD, 1e-12); // R, as in the growth-of-money moments above
    }

    [Fact]
    public void A_design_with_dependent_columns_or_the_wrong_row_count_is_rejected()
    {
        var dependent = new double[6, 3];
        for (var i = 0; i < 6; i++)
        {
            dependent[i, 0] = 1;
            dependent[i, 1] = i;
            dependent[i, 2] = 2 + (3 * i); // 2·(column 0) + 3·(column 1)
        }

        double[] e = [0.3, -0.1, -0.4, 0.2, 0.5, -0.5];
        Assert.Throws<ArgumentException>(() => DurbinWatson.Test(e, dependent));
        Assert.Throws<ArgumentException>(() => DurbinWatson.Test(e.AsSpan(0, 5), OrderFixtures.WithIntercept([1, 2, 3, 4, 5, 6])));
    }
}
