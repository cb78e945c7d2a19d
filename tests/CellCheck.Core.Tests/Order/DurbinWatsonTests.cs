using CellCheck.Core.Order;
using CellCheck.Core.Tests.Statistics;
using Xunit.Abstractions;

namespace CellCheck.Core.Tests.Order;

public sealed class DurbinWatsonTests
{
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
        // exact p: reference lmtest::dwtest(exact = TRUE) 0.983870195136 and two-sided 0.0322596097281 (reference
        // README); tolerance 1e-7 absolute, the accuracy required of the exact distribution.
        Close.Absolute(0.983870195136, positive.P, 1e-7);
        Close.Absolute(0.0322596097281, twoSided.P, 1e-7);
        Assert.Equal(OrderMethods.Exact, positive.Method);
        output.WriteLine($"d {positive.D:R} p {positive.P:R} two {twoSided.P:R} E {positive.ExpectedD:R} V {positive.VarianceD:R}");
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
        output.WriteLine($"p {approximate.P:R}");
    }

    private readonly ITestOutputHelper output;

    public DurbinWatsonTests(ITestOutputHelper output) => this.output = output;
}
