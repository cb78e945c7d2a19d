using MathNet.Numerics.Distributions;

namespace CellCheck.Core.Tests.Scale;

/// <summary>
/// The run-order statistics from their definitions, with compensated sums and no production code, on residuals in run
/// order (<see cref="ReferenceCells.ResidualsInRunOrder"/>).
/// </summary>
internal static class ReferenceOrder
{
    /// <summary>Durbin &amp; Watson (1950): d = Σ_{t≥2} (e_t − e_{t−1})² / Σ e_t².</summary>
    public static double DurbinWatson(double[] e)
    {
        var differences = default(CompensatedSum);
        for (var t = 1; t < e.Length; t++)
        {
            differences.Add((e[t] - e[t - 1]) * (e[t] - e[t - 1]));
        }

        return differences.Value / SumOfSquares(e);
    }

    /// <summary>The lag-1 autocorrelation about zero, r1 = Σ_{t≥2} e_t e_{t−1} / Σ e_t².</summary>
    public static double Lag1(double[] e)
    {
        var products = default(CompensatedSum);
        for (var t = 1; t < e.Length; t++)
        {
            products.Add(e[t] * e[t - 1]);
        }

        return products.Value / SumOfSquares(e);
    }

    /// <summary>
    /// The runs test about the median (Wald &amp; Wolfowitz 1940): values equal to the median dropped, R runs of n1 values
    /// below and n2 above, E[R] = 1 + 2n1n2/n, Var[R] = 2n1n2(2n1n2 − n)/(n²(n − 1)), two-sided normal p without continuity
    /// correction (both sides here hold far more than 20 values, where the exact distribution is not used).
    /// </summary>
    public static ReferenceOutcome Runs(double[] e)
    {
        var median = ReferenceSpread.Median(e);
        var signs = e.Where(v => v != median).Select(v => v > median).ToArray();
        var runs = 1 + Enumerable.Range(1, signs.Length - 1).Count(t => signs[t] != signs[t - 1]);
        double n2 = signs.Count(s => s);
        double n1 = signs.Length - n2;
        double n = signs.Length;
        var expected = 1 + (2 * n1 * n2 / n);
        var variance = 2 * n1 * n2 * ((2 * n1 * n2) - n) / (n * n * (n - 1));
        var z = (runs - expected) / Math.Sqrt(variance);
        return new ReferenceOutcome(runs, 2 * ReferenceTails.Normal(Math.Abs(z)));
    }

    /// <summary>
    /// The least-squares slope of the residuals on run position, b = Σ (t − t̄)(e − ē) / Σ (t − t̄)², with
    /// SE = √(Σ (e − ē − b(t − t̄))² / (n − 2) / Σ (t − t̄)²) and a two-sided Student t p on n − 2 degrees of freedom
    /// (Draper &amp; Smith 1998, ch. 1).
    /// </summary>
    public static ReferenceOutcome Trend(double[] e, double[] t)
    {
        var n = e.Length;
        var tMean = ReferenceCells.CarefulMean(t);
        var eMean = ReferenceCells.CarefulMean(e);
        var sxx = default(CompensatedSum);
        var sxy = default(CompensatedSum);
        for (var i = 0; i < n; i++)
        {
            sxx.Add((t[i] - tMean) * (t[i] - tMean));
            sxy.Add((t[i] - tMean) * (e[i] - eMean));
        }

        var slope = sxy.Value / sxx.Value;
        var sse = default(CompensatedSum);
        for (var i = 0; i < n; i++)
        {
            var r = e[i] - eMean - (slope * (t[i] - tMean));
            sse.Add(r * r);
        }

        var se = Math.Sqrt(sse.Value / (n - 2) / sxx.Value);
        return new ReferenceOutcome(slope, 2 * StudentT.CDF(0, 1, n - 2, -Math.Abs(slope / se)), n - 2);
    }

    private static double SumOfSquares(double[] e)
    {
        var squares = default(CompensatedSum);
        foreach (var v in e)
        {
            squares.Add(v * v);
        }

        return squares.Value;
    }
}
