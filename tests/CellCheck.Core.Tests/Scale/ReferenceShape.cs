namespace CellCheck.Core.Tests.Scale;

/// <summary>
/// Moment statistics written from their definitions with compensated sums and no production code: with
/// m_k = Σ (x − x̄)ᵏ / n about the careful mean, skewness g1 = m3 / m2^(3/2), excess kurtosis g2 = m4 / m2² − 3, SD with
/// divisor n − 1; and the D'Agostino-Pearson K² (D'Agostino, Belanger &amp; D'Agostino 1990, The American
/// Statistician 44, 316-321, equations for Z(√b1) and Z(b2)).
/// </summary>
internal static class ReferenceShape
{
    /// <summary>Mean, SD (divisor n − 1), skewness g1 and excess kurtosis g2.</summary>
    public static (double Mean, double Sd, double Skewness, double Kurtosis) Moments(double[] x)
    {
        var (mean, m2, m3, m4) = Central(x);
        double n = x.Length;
        return (mean, Math.Sqrt(m2 * n / (n - 1)), m3 / Math.Pow(m2, 1.5), (m4 / (m2 * m2)) - 3.0);
    }

    /// <summary>K² = Z(√b1)² + Z(b2)², with p = exp(−K²/2), the chi-square upper tail on two degrees of freedom.</summary>
    public static ReferenceOutcome DagostinoPearson(double[] x)
    {
        var (_, m2, m3, m4) = Central(x);
        double n = x.Length;

        // D'Agostino (1970): Johnson S_U transform of √b1
        var rootB1 = m3 / Math.Pow(m2, 1.5);
        var y = rootB1 * Math.Sqrt((n + 1) * (n + 3) / (6 * (n - 2)));
        var beta2 = 3 * ((n * n) + (27 * n) - 70) * (n + 1) * (n + 3) / ((n - 2) * (n + 5) * (n + 7) * (n + 9));
        var w2 = -1 + Math.Sqrt(2 * (beta2 - 1));
        var delta = 1 / Math.Sqrt(Math.Log(Math.Sqrt(w2)));
        var alpha = Math.Sqrt(2 / (w2 - 1));
        var zSkew = delta * Math.Log((y / alpha) + Math.Sqrt(((y / alpha) * (y / alpha)) + 1));

        // Anscombe & Glynn (1983): Wilson-Hilferty cube root of a fitted transform of b2
        var b2 = m4 / (m2 * m2);
        var mean = 3 * (n - 1) / (n + 1);
        var variance = 24 * n * (n - 2) * (n - 3) / ((n + 1) * (n + 1) * (n + 3) * (n + 5));
        var standardised = (b2 - mean) / Math.Sqrt(variance);
        var rootBeta1 = 6 * ((n * n) - (5 * n) + 2) / ((n + 7) * (n + 9)) * Math.Sqrt(6 * (n + 3) * (n + 5) / (n * (n - 2) * (n - 3)));
        var a = 6 + (8 / rootBeta1 * ((2 / rootBeta1) + Math.Sqrt(1 + (4 / (rootBeta1 * rootBeta1)))));
        var ratio = (1 - (2 / a)) / (1 + (standardised * Math.Sqrt(2 / (a - 4))));
        var zKurt = (1 - (2 / (9 * a)) - Math.Cbrt(ratio)) / Math.Sqrt(2 / (9 * a));

        var k2 = (zSkew * zSkew) + (zKurt * zKurt);
        return new ReferenceOutcome(k2, Math.Exp(-k2 / 2), 2);
    }

    private static (double Mean, double M2, double M3, double M4) Central(double[] x)
    {
        var mean = ReferenceCells.CarefulMean(x);
        var s2 = default(CompensatedSum);
        var s3 = default(CompensatedSum);
        var s4 = default(CompensatedSum);
        foreach (var v in x)
        {
            var d = v - mean;
            s2.Add(d * d);
            s3.Add(d * d * d);
            s4.Add(d * d * d * d);
        }

        double n = x.Length;
        return (mean, s2.Value / n, s3.Value / n, s4.Value / n);
    }
}
