using MathNet.Numerics.Distributions;

namespace CellCheck.Core.Tests.Scale;

/// <summary>
/// The Anderson-Darling statistic with estimated mean and variance, from its definition (Anderson &amp; Darling 1954;
/// D'Agostino &amp; Stephens 1986, Goodness-of-Fit Techniques, ch. 4) with no production code:
/// A² = −n − (1/n) Σ (2i − 1) [ln Φ(z₍ᵢ₎) + ln Φ(−z₍ₙ₊₁₋ᵢ₎)], z = (x − x̄)/s with s the n − 1 standard deviation, the
/// sum compensated; p from A* = A²(1 + 0.75/n + 2.25/n²) by the four formulas of D'Agostino &amp; Stephens (1986)
/// Table 4.9.
/// </summary>
/// <remarks>
/// The last formula, exp(1.2937 − 5.709A* + 0.0186A*²), has its minimum at A* = 5.709/0.0372 and turns upward beyond
/// it, which no tail probability does; CellCheck documents that it holds p at that minimum there (AndersonDarling's
/// remarks), and the reference follows the same rule. Far in the lower tail, where Φ underflows, ln Φ(−x) is taken as
/// −x²/2 − ln √(2π) + ln R(x) with Mills' ratio R(x) = 1/(x + 1/(x + 2/(x + 3/(x + …)))) (Laplace's continued fraction,
/// Abramowitz &amp; Stegun 1964, 26.2.14).
/// </remarks>
internal static class ReferenceAndersonDarling
{
    public static ReferenceOutcome Test(double[] x)
    {
        var n = x.Length;
        var sorted = x.Order().ToArray();
        var mean = ReferenceCells.CarefulMean(sorted);
        var sd = Math.Sqrt(ReferenceSpread.Variance(sorted));
        var sum = default(CompensatedSum);
        for (var i = 1; i <= n; i++)
        {
            var lower = LogPhi((sorted[i - 1] - mean) / sd);
            var upper = LogPhi(-(sorted[n - i] - mean) / sd);
            sum.Add(((2.0 * i) - 1) * (lower + upper));
        }

        var a2 = -n - (sum.Value / n);
        var a = Math.Min(a2 * (1 + (0.75 / n) + (2.25 / ((double)n * n))), 5.709 / (2 * 0.0186));
        var p = a < 0.2 ? 1 - Math.Exp(-13.436 + (101.14 * a) - (223.73 * a * a))
            : a < 0.34 ? 1 - Math.Exp(-8.318 + (42.796 * a) - (59.938 * a * a))
            : a < 0.6 ? Math.Exp(0.9177 - (4.279 * a) - (1.38 * a * a))
            : Math.Exp(1.2937 - (5.709 * a) + (0.0186 * a * a));
        return new ReferenceOutcome(a2, p);
    }

    /// <summary>ln Φ(z): directly above z = −20, by Mills' ratio below (Φ(−20) ≈ 2.8e-89 is still far from underflow).</summary>
    private static double LogPhi(double z)
    {
        if (z > -20)
        {
            return Math.Log(Normal.CDF(0, 1, z));
        }

        var x = -z;
        var fraction = x;
        for (var k = 100; k >= 1; k--)
        {
            fraction = x + (k / fraction);
        }

        return (-0.5 * x * x) - (0.5 * Math.Log(2 * Math.PI)) - Math.Log(fraction);
    }
}
