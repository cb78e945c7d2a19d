using CellCheck.Core.Order;
using CellCheck.Core.Tests.Statistics;

namespace CellCheck.Core.Tests.Order;

public sealed class QuadraticFormCdfTests
{
    // The integration bounds its error below 1e-10 (observed ~6e-14); closed forms are exact, so 1e-11 absolute.
    private const double Tolerance = 1e-11;

    [Theory]
    [InlineData(1.0, 1.0)]
    [InlineData(3.0, 0.5)]
    [InlineData(1e-4, 2.0)]
    [InlineData(4.0, 1e-6)]
    public void Two_weights_of_opposite_sign_give_the_arctangent_law(double a, double b)
    {
        // P(a z₁² − b z₂² ≤ 0) = P(|z₁/z₂| ≤ √(b/a)) = (2/π) arctan √(b/a), the Cauchy law of z₁/z₂. Two terms is
        // the slowest decay of Imhof's integrand (like 1/u²), the hardest case for the truncation.
        var (p, bound) = QuadraticFormCdf.LowerTailAtZero([a, -b]);

        Close.Absolute(2 / Math.PI * Math.Atan(Math.Sqrt(b / a)), p, Tolerance);
        Assert.True(bound < 1e-10);
    }

    [Theory]
    [InlineData(1.0, 3.0)]
    [InlineData(2.5, 0.1)]
    public void Repeated_weights_give_the_exponential_ratio_law(double a, double b)
    {
        // a(z₁² + z₂²) − b(z₃² + z₄²): each pair is 2·Exp(1), so P(Q ≤ 0) = P(a E₁ ≤ b E₂) = b / (a + b).
        // Repeated weights are where formulas integrating between the weights need special care.
        var (p, _) = QuadraticFormCdf.LowerTailAtZero([a, a, -b, -b]);

        Close.Absolute(b / (a + b), p, Tolerance);
    }

    [Fact]
    public void Weights_of_one_sign_give_zero_or_one_and_zero_weights_are_ignored()
    {
        Assert.Equal(0.0, QuadraticFormCdf.LowerTailAtZero([1.0, 2.0, 0.0]).Probability);
        Assert.Equal(1.0, QuadraticFormCdf.LowerTailAtZero([-1.0, 0.0]).Probability);
        Assert.Equal(1.0, QuadraticFormCdf.LowerTailAtZero([0.0, 0.0]).Probability); // Q ≡ 0
        Close.Absolute(0.5, QuadraticFormCdf.LowerTailAtZero([2.0, 0.0, -2.0]).Probability, Tolerance); // symmetry
    }
}
