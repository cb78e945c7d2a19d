using MathNet.Numerics;

namespace CellCheck.Core.Planning;

/// <summary>
/// The noncentral F distribution with <c>df1</c>, <c>df2</c> degrees of freedom and noncentrality λ, as the
/// Poisson mixture of incomplete beta functions (Johnson, Kotz &amp; Balakrishnan 1995, Continuous Univariate
/// Distributions vol. 2, ch. 30): with x = df1·f / (df1·f + df2), y = 1 − x and μ = λ/2,
/// P(F' ≤ f) = Σ_j w_j I_x(df1/2 + j, df2/2) and P(F' &gt; f) = Σ_j w_j I_y(df2/2, df1/2 + j), w_j = e^(−μ) μ^j / j!.
/// </summary>
/// <remarks>
/// Each tail is summed directly (the upper tail is never 1 − CDF), so small power and small p keep their relative
/// precision. Summation starts at the Poisson mode (weights by Loader's saddle-point form, <see cref="PoissonWeight"/>)
/// and runs outward in both directions; it stops when a bound on everything not yet added is below 1e-16 of the sum.
/// Beyond index j the weights fall at least geometrically with ratio μ/(j + 1) upward and j/μ downward, and the beta
/// terms are monotone in j (the CDF terms fall with j, the upper-tail terms rise), which gives the bound.
/// Each beta term is MathNet's regularized incomplete beta evaluated on the side where its continued fraction needs
/// no reflection. λ = 0 leaves the single term j = 0: the central F.
/// </remarks>
public static class NoncentralF
{
    private const double RelativeBound = 1e-16;
    private const int MaxTerms = 1_000_000;

    /// <summary>P(F' &gt; f): the power of an F test with critical value f when the noncentrality is λ.</summary>
    public static double UpperTail(double f, double df1, double df2, double lambda) => Tail(f, df1, df2, lambda, upper: true);

    /// <summary>P(F' ≤ f).</summary>
    public static double Cdf(double f, double df1, double df2, double lambda) => Tail(f, df1, df2, lambda, upper: false);

    private static double Tail(double f, double df1, double df2, double lambda, bool upper)
    {
        if (!(df1 > 0) || !(df2 > 0) || !(lambda >= 0) || double.IsInfinity(lambda))
        {
            throw new ArgumentOutOfRangeException(nameof(lambda), $"needs df1 > 0, df2 > 0 and finite λ ≥ 0 (got {df1}, {df2}, {lambda})");
        }

        if (double.IsNaN(f))
        {
            return double.NaN;
        }

        if (f <= 0)
        {
            return upper ? 1.0 : 0.0;
        }

        if (double.IsPositiveInfinity(f))
        {
            return upper ? 0.0 : 1.0;
        }

        var denominator = (df1 * f) + df2;
        var x = df1 * f / denominator;
        var y = df2 / denominator;
        var mean = lambda / 2;
        if (mean > int.MaxValue / 4)
        {
            throw new ArgumentOutOfRangeException(nameof(lambda), lambda, "noncentrality too large for the series");
        }

        var mode = (int)Math.Floor(mean);
        var weight = PoissonWeight.Of(mode, mean);
        var term = Beta(df1 / 2 + mode, df2 / 2, x, y, upper);
        var sum = weight * term;

        // upward from the mode: weights fall by mean / (j + 1); CDF terms fall, upper-tail terms rise towards 1
        var w = weight;
        for (var j = mode + 1; j < mode + MaxTerms; j++)
        {
            var ratio = mean / j;
            w *= ratio;
            var b = Beta(df1 / 2 + j, df2 / 2, x, y, upper);
            sum += w * b;
            var next = mean / (j + 1);
            if (w == 0 || (next < 1 && w * next / (1 - next) * (upper ? 1.0 : b) <= RelativeBound * sum))
            {
                break;
            }
        }

        // downward from the mode: weights fall by j / mean; CDF terms rise towards 1, upper-tail terms fall
        w = weight;
        for (var j = mode - 1; j >= 0; j--)
        {
            w *= (j + 1) / mean;
            var b = Beta(df1 / 2 + j, df2 / 2, x, y, upper);
            sum += w * b;
            var ratio = j / mean;
            if (w == 0 || w * ratio / (1 - ratio) * (upper ? b : 1.0) <= RelativeBound * sum)
            {
                break;
            }
        }

        return Math.Clamp(sum, 0.0, 1.0);
    }

    /// <summary>I_x(a, b) (lower) or I_y(b, a) = 1 − I_x(a, b) (upper), each from the side that needs no subtraction when it is small.</summary>
    private static double Beta(double a, double b, double x, double y, bool upper)
    {
        if (upper)
        {
            return y < (b + 1) / (a + b + 2) ? SpecialFunctions.BetaRegularized(b, a, y) : 1.0 - SpecialFunctions.BetaRegularized(a, b, x);
        }

        return x < (a + 1) / (a + b + 2) ? SpecialFunctions.BetaRegularized(a, b, x) : 1.0 - SpecialFunctions.BetaRegularized(b, a, y);
    }
}
