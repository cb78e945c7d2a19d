using MathNet.Numerics.Distributions;

namespace CellCheck.Core.Models;

/// <summary>
/// Screens externally studentized residuals for outliers: under normal errors t_i follows Student's t with ν − 1
/// degrees of freedom (Belsley, Kuh &amp; Welsch 1980); the two-sided p of the largest |t_i| is multiplied by the
/// number of residuals screened (Bonferroni bound), so the chance of naming any row on clean data is at most alpha.
/// Skipped when fewer than 3 residual degrees of freedom remain.
/// </summary>
public static class OutlierScreen
{
    public const int MinimumResidualDf = 3;

    /// <returns>Every screened row with its Bonferroni-adjusted p, most extreme first; empty (and
    /// <paramref name="screened"/> 0) when skipped.</returns>
    public static IReadOnlyList<(int Row, double T, double PAdjusted)> Screen(ReadOnlySpan<double> external, int residualDf, out int screened)
    {
        screened = 0;
        if (residualDf < MinimumResidualDf)
        {
            return [];
        }

        foreach (var t in external)
        {
            screened += double.IsFinite(t) ? 1 : 0;
        }

        var result = new List<(int, double, double)>();
        for (var i = 0; i < external.Length; i++)
        {
            var t = external[i];
            if (!double.IsFinite(t))
            {
                continue;
            }

            var p = 2 * StudentT.CDF(0, 1, residualDf - 1, -Math.Abs(t));
            result.Add((i, t, Math.Min(1, p * screened)));
        }

        return [.. result.OrderBy(r => r.Item3).ThenByDescending(r => Math.Abs(r.Item2))];
    }
}
