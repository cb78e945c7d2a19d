using MathNet.Numerics;

namespace CellCheck.Core.Planning;

/// <summary>
/// Poisson probabilities e^(−μ) μ^k / k! by Loader's saddle-point form (Loader 2000, "Fast and accurate computation
/// of binomial probabilities"): p = exp(−δ(k) − D(k, μ)) / √(2πk), with δ the Stirling-series remainder of log k!
/// and D(k, μ) = k log(k/μ) + μ − k evaluated without cancellation near k = μ. The naive
/// exp(k log μ − μ − log k!) loses about μ·ε of relative precision; this form keeps full precision for large μ.
/// </summary>
internal static class PoissonWeight
{
    private static readonly double HalfLogTwoPi = 0.5 * Math.Log(2 * Math.PI);

    /// <summary>P(K = k) for K ~ Poisson(μ), μ ≥ 0, k ≥ 0.</summary>
    public static double Of(int k, double mean)
    {
        if (mean == 0)
        {
            return k == 0 ? 1.0 : 0.0;
        }

        if (k == 0)
        {
            return Math.Exp(-mean);
        }

        return Math.Exp(-StirlingRemainder(k) - Deviance(k, mean)) / Math.Sqrt(2 * Math.PI * k);
    }

    /// <summary>δ(k) = log k! − (k + ½) log k + k − ½ log 2π: directly for small k, by the Stirling series above 15.</summary>
    internal static double StirlingRemainder(int k)
    {
        if (k <= 15)
        {
            return SpecialFunctions.GammaLn(k + 1.0) - ((k + 0.5) * Math.Log(k)) + k - HalfLogTwoPi;
        }

        double n = k;
        var n2 = n * n;
        // 1/12n − 1/360n³ + 1/1260n⁵ − 1/1680n⁷ + 1/1188n⁹ (Abramowitz & Stegun 6.1.41); the next term is below 1e-17 at n = 16
        return (1.0 / 12 - (1.0 / 360 - (1.0 / 1260 - (1.0 / 1680 - 1.0 / 1188 / n2) / n2) / n2) / n2) / n;
    }

    /// <summary>D(k, μ) = k log(k/μ) + μ − k, by the series 2k Σ v^(2j+1)/(2j+1) − (k − μ)v with v = (k − μ)/(k + μ) near k = μ.</summary>
    internal static double Deviance(double k, double mean)
    {
        if (Math.Abs(k - mean) < 0.1 * (k + mean))
        {
            var v = (k - mean) / (k + mean);
            var s = (k - mean) * v;
            var term = 2 * k * v;
            var v2 = v * v;
            for (var j = 1; j < 1000; j++)
            {
                term *= v2;
                var next = s + (term / ((2 * j) + 1));
                if (next == s)
                {
                    return s;
                }

                s = next;
            }

            return s;
        }

        return (k * Math.Log(k / mean)) + mean - k;
    }
}
