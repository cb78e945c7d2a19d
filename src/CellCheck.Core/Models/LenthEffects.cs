using MathNet.Numerics.Distributions;

namespace CellCheck.Core.Models;

/// <summary>
/// Effects of an unreplicated two-level factorial and Lenth's (1989, "Quick and easy analysis of unreplicated
/// factorials", Technometrics 31, 469-473) pseudo standard error: with m effects c_j, s₀ = 1.5 median|c_j|,
/// PSE = 1.5 median{|c_j| : |c_j| &lt; 2.5 s₀}; margin of error ME = t(0.975; m/3) PSE and simultaneous margin
/// SME = t(γ; m/3) PSE with γ = (1 + 0.95^{1/m}) / 2. Effects are the usual ±1 contrasts divided by N/2; the
/// half-normal plot pairs |c| in ascending order with Φ⁻¹(0.5 + 0.5 (i − 0.5)/m).
/// </summary>
public static class LenthEffects
{
    /// <param name="codes">Per factor, the level code (0 or 1) of each row.</param>
    /// <param name="terms">The terms whose effects are estimated (factor index lists).</param>
    public static LenthResult Analyze(IReadOnlyList<int[]> codes, ReadOnlySpan<double> y, IReadOnlyList<IReadOnlyList<int>> terms)
    {
        ArgumentNullException.ThrowIfNull(codes);
        ArgumentNullException.ThrowIfNull(terms);
        var n = y.Length;
        var effects = new double[terms.Count];
        for (var t = 0; t < terms.Count; t++)
        {
            var sum = 0.0;
            for (var i = 0; i < n; i++)
            {
                var sign = 1.0;
                foreach (var f in terms[t])
                {
                    sign *= codes[f][i] == 0 ? -1.0 : 1.0;
                }

                sum += sign * y[i];
            }

            effects[t] = sum / (n / 2.0);
        }

        var m = effects.Length;
        var abs = effects.Select(Math.Abs).Order().ToArray();
        var s0 = 1.5 * Median(abs);
        var pse = 1.5 * Median(abs.Where(a => a < 2.5 * s0).ToArray());
        var df = m / 3.0;
        var me = StudentT.InvCDF(0, 1, df, 0.975) * pse;
        var sme = StudentT.InvCDF(0, 1, df, (1 + Math.Pow(0.95, 1.0 / m)) / 2) * pse;
        var order = Enumerable.Range(0, m).OrderBy(j => Math.Abs(effects[j])).ToArray();
        var quantiles = new double[m];
        for (var rank = 0; rank < m; rank++)
        {
            quantiles[order[rank]] = Normal.InvCDF(0, 1, 0.5 + (0.5 * (rank + 0.5) / m));
        }

        return new LenthResult(effects, quantiles, pse, me, sme);
    }

    private static double Median(double[] sorted) => sorted.Length == 0 ? double.NaN
        : sorted.Length % 2 == 1 ? sorted[sorted.Length / 2] : 0.5 * (sorted[(sorted.Length / 2) - 1] + sorted[sorted.Length / 2]);
}
