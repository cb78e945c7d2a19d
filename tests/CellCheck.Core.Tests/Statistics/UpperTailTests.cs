using CellCheck.Core.Statistics;
using CellCheck.Core.Tests.Support;

namespace CellCheck.Core.Tests.Statistics;

public sealed class UpperTailTests
{
    // R's pf and pchisq are accurate to near double precision (R 4.2.2, Fixtures/check-values.R);
    // 1e-9 relative is the project's target for p-values from MathNet functions (observed ≤ 7e-13, in the 1e-243 tail).
    private const double Tolerance = 1e-9;

    [Theory]
    // R 4.2.2 pf(50, 3, 40, lower.tail = FALSE): tail evaluated directly
    [InlineData(50.0, 3, 40, 1.3443392666414127e-13)]
    // R 4.2.2 pf(0.01, 3, 40, lower.tail = FALSE): above the reflection point, taken as 1 − CDF
    [InlineData(0.01, 3, 40, 0.99860583655137825)]
    // R 4.2.2 pf(10, 1, 1000, lower.tail = FALSE)
    [InlineData(10.0, 1, 1000, 0.0016125523948250543)]
    // R 4.2.2 pf(201, 8, 1800, lower.tail = FALSE): far below the smallest 1 − CDF could show
    [InlineData(201.0, 8, 1800, 4.0371418857532225e-243)]
    public void F_upper_tail_matches_R(double f, double df1, double df2, double p)
    {
        Accuracy.AssertRelative(p, UpperTail.F(f, df1, df2), Tolerance);
    }

    [Theory]
    // R 4.2.2 pchisq(200, 5, lower.tail = FALSE)
    [InlineData(200.0, 5, 2.8406228986415315e-41)]
    // R 4.2.2 pchisq(0.5, 5, lower.tail = FALSE)
    [InlineData(0.5, 5, 0.9921232932326296)]
    // R 4.2.2 pchisq(1000, 11, lower.tail = FALSE)
    [InlineData(1000.0, 11, 1.9194894047306497e-207)]
    public void Chi_square_upper_tail_matches_R(double x, double df, double p)
    {
        Accuracy.AssertRelative(p, UpperTail.ChiSquare(x, df), Tolerance);
    }

    [Fact]
    public void Boundary_arguments_give_the_limits()
    {
        Assert.Equal(1.0, UpperTail.F(0.0, 2, 10));
        Assert.Equal(0.0, UpperTail.F(double.PositiveInfinity, 2, 10));
        Assert.True(double.IsNaN(UpperTail.F(1.0, 0, 10)));
        Assert.Equal(1.0, UpperTail.ChiSquare(0.0, 3));
        Assert.True(double.IsNaN(UpperTail.ChiSquare(double.NaN, 3)));
    }
}
