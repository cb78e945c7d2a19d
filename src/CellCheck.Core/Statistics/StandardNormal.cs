using MathNet.Numerics;

namespace CellCheck.Core.Statistics;

/// <summary>
/// Standard normal distribution functions that stay accurate far into the tails: tail areas through the
/// complementary error function, and log Φ through an asymptotic series where Φ itself would underflow.
/// </summary>
internal static class StandardNormal
{
    private const double InvSqrt2 = 0.70710678118654752440;
    private const double HalfLog2Pi = 0.91893853320467274178;

    /// <summary>Below this z the asymptotic series for log Φ is used; at |z| = 30 its terms fall by a factor
    /// of at least 30² / 21 per step, so ten terms reach full double precision, and erfc(30/√2) ≈ 5e-198 is
    /// still a normal double above it.</summary>
    private const double SeriesLimit = -30.0;

    /// <summary>Φ(z), the lower tail area.</summary>
    internal static double Cdf(double z) => 0.5 * SpecialFunctions.Erfc(-z * InvSqrt2);

    /// <summary>1 − Φ(z), the upper tail area, without cancellation for large z.</summary>
    internal static double UpperTail(double z) => 0.5 * SpecialFunctions.Erfc(z * InvSqrt2);

    /// <summary>Φ⁻¹(p), the standard normal quantile.</summary>
    internal static double Quantile(double p) => -Math.Sqrt(2.0) * SpecialFunctions.ErfcInv(2.0 * p);

    /// <summary>
    /// log Φ(z), finite for every finite z. For z ≥ 0 it is log1p(−Q(z)); for −30 ≤ z &lt; 0 the log of the erfc
    /// form; below −30 the asymptotic expansion Φ(z) = φ(z)/|z| · Σ (−1)ᵏ (2k − 1)!! / z²ᵏ (Abramowitz &amp; Stegun
    /// 1964, 26.2.12), taken in logs.
    /// </summary>
    internal static double LogCdf(double z)
    {
        if (double.IsNaN(z))
        {
            return double.NaN;
        }

        if (z >= 0.0)
        {
            return LogOnePlus(-UpperTail(z));
        }

        if (z >= SeriesLimit)
        {
            return Math.Log(Cdf(z));
        }

        var z2 = z * z;
        var term = 1.0;
        var sum = 1.0;
        for (var k = 1; k <= 12; k++)
        {
            term *= -(2.0 * k - 1.0) / z2;
            sum += term;
        }

        return (-0.5 * z2) - Math.Log(-z) - HalfLog2Pi + Math.Log(sum);
    }

    /// <summary>(log Φ(z), log Φ(−z)) from one complementary error function: the same values as two calls of
    /// <see cref="LogCdf"/>, bit for bit (both tails are the erfc of |z|/√2 and its complement), at half the cost.</summary>
    internal static (double Lower, double Upper) LogCdfBoth(double z)
    {
        if (!(Math.Abs(z) <= -SeriesLimit) || z == 0.0)
        {
            return (LogCdf(z), LogCdf(-z));
        }

        if (z > 0.0)
        {
            var q = UpperTail(z);
            return (LogOnePlus(-q), Math.Log(q));
        }

        var p = Cdf(z);
        return (Math.Log(p), LogOnePlus(-p));
    }

    /// <summary>log(1 + x) accurate for small x (Goldberg 1991, "What every computer scientist should know
    /// about floating-point arithmetic", Theorem 4): the rounding of 1 + x cancels in log(u)·x/(u − 1).</summary>
    internal static double LogOnePlus(double x)
    {
        var u = 1.0 + x;
        return u == 1.0 ? x : Math.Log(u) * x / (u - 1.0);
    }
}
