using MathNet.Numerics.Distributions;

namespace CellCheck.Core.Tests.Scale;

/// <summary>
/// The Shapiro-Wilk W (Shapiro &amp; Wilk 1965) with Royston's weights and p-value (Royston 1992, Statistics and
/// Computing 2, 117-119; Royston 1995, Applied Statistics 44, 547-551), written from the papers with no production code:
/// m_i = Φ⁻¹((i − 3/8)/(n + 1/4)); c = m / √(m'm); with u = 1/√n,
/// a_n = c_n + 0.221157u − 0.147981u² − 2.071190u³ + 4.434685u⁴ − 2.706056u⁵ and (n &gt; 5)
/// a_(n−1) = c_(n−1) + 0.042981u − 0.293762u² − 1.752461u³ + 5.682633u⁴ − 3.582633u⁵, a_1 = −a_n, a_2 = −a_(n−1),
/// the other a_i = m_i / √φ with φ making a a unit vector; for n = 3, a_3 = √½. W = (Σ a_i x₍ᵢ₎)² / Σ (x − x̄)².
/// </summary>
internal static class ReferenceShapiroWilk
{
    public static ReferenceOutcome Test(double[] x)
    {
        var n = x.Length;
        var sorted = x.Order().ToArray();
        var a = Weights(n);
        var mean = ReferenceCells.CarefulMean(sorted);
        var numerator = default(CompensatedSum);
        var denominator = default(CompensatedSum);
        for (var i = 0; i < n; i++)
        {
            numerator.Add(a[i] * (sorted[i] - mean)); // Σ a_i = 0, so centring changes nothing but rounding
            denominator.Add((sorted[i] - mean) * (sorted[i] - mean));
        }

        var w = numerator.Value * numerator.Value / denominator.Value;
        return new ReferenceOutcome(w, n <= 5000 ? PValue(w, n) : double.NaN);
    }

    private static double[] Weights(int n)
    {
        var a = new double[n];
        if (n == 3)
        {
            a[0] = -Math.Sqrt(0.5);
            a[2] = Math.Sqrt(0.5);
            return a;
        }

        var m = new double[n];
        var mm = default(CompensatedSum);
        for (var i = 1; i <= n; i++)
        {
            m[i - 1] = Normal.InvCDF(0, 1, (i - 0.375) / (n + 0.25));
            mm.Add(m[i - 1] * m[i - 1]);
        }

        var u = 1 / Math.Sqrt(n);
        var root = Math.Sqrt(mm.Value);
        a[n - 1] = (m[n - 1] / root) + (0.221157 * u) - (0.147981 * Math.Pow(u, 2)) - (2.071190 * Math.Pow(u, 3))
            + (4.434685 * Math.Pow(u, 4)) - (2.706056 * Math.Pow(u, 5));
        a[0] = -a[n - 1];
        double phi;
        int corrected;
        if (n > 5)
        {
            a[n - 2] = (m[n - 2] / root) + (0.042981 * u) - (0.293762 * Math.Pow(u, 2)) - (1.752461 * Math.Pow(u, 3))
                + (5.682633 * Math.Pow(u, 4)) - (3.582633 * Math.Pow(u, 5));
            a[1] = -a[n - 2];
            phi = (mm.Value - (2 * m[n - 1] * m[n - 1]) - (2 * m[n - 2] * m[n - 2])) / (1 - (2 * a[n - 1] * a[n - 1]) - (2 * a[n - 2] * a[n - 2]));
            corrected = 2;
        }
        else
        {
            phi = (mm.Value - (2 * m[n - 1] * m[n - 1])) / (1 - (2 * a[n - 1] * a[n - 1]));
            corrected = 1;
        }

        for (var i = corrected; i < n - corrected; i++)
        {
            a[i] = m[i] / Math.Sqrt(phi);
        }

        return a;
    }

    /// <summary>
    /// Royston's p: n = 3 exact, (6/π)(asin √W − asin √(3/4)); 4 ≤ n ≤ 11, −ln(γ − ln(1 − W)) with γ = −2.273 + 0.459n
    /// normal with mean 0.5440 − 0.39978n + 0.025054n² − 0.0006714n³ and ln SD 1.3822 − 0.77857n + 0.062767n² − 0.0020322n³;
    /// n ≥ 12, ln(1 − W) normal with mean −1.5861 − 0.31082v − 0.083751v² + 0.0038915v³ and ln SD
    /// −0.4803 − 0.082676v + 0.0030302v², v = ln n.
    /// </summary>
    private static double PValue(double w, int n)
    {
        if (n == 3)
        {
            return Math.Max(0, 6 / Math.PI * (Math.Asin(Math.Sqrt(w)) - Math.Asin(Math.Sqrt(0.75))));
        }

        var y = Math.Log(1 - w);
        if (n <= 11)
        {
            var gamma = -2.273 + (0.459 * n);
            var mean = 0.5440 - (0.39978 * n) + (0.025054 * n * n) - (0.0006714 * n * n * n);
            var sd = Math.Exp(1.3822 - (0.77857 * n) + (0.062767 * n * n) - (0.0020322 * n * n * n));
            return y >= gamma ? 0 : ReferenceTails.Normal((-Math.Log(gamma - y) - mean) / sd);
        }

        var v = Math.Log(n);
        var meanLarge = -1.5861 - (0.31082 * v) - (0.083751 * v * v) + (0.0038915 * v * v * v);
        var sdLarge = Math.Exp(-0.4803 - (0.082676 * v) + (0.0030302 * v * v));
        return ReferenceTails.Normal((y - meanLarge) / sdLarge);
    }
}
