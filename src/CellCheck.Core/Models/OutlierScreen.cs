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

    /// <returns>The screened rows whose Bonferroni-adjusted p is below one, and always the most extreme row, most
    /// extreme first; empty (and <paramref name="screened"/> 0) when skipped. Rows below the |t| that makes the
    /// adjusted p reach one are not listed (their adjusted p is 1), so at a million rows only a handful of t
    /// probabilities are computed.</returns>
    public static IReadOnlyList<(int Row, double T, double PAdjusted)> Screen(ReadOnlySpan<double> external, int residualDf, out int screened)
    {
        screened = 0;
        if (residualDf < MinimumResidualDf)
        {
            return [];
        }

        var extreme = -1;
        foreach (var t in external)
        {
            screened += double.IsFinite(t) ? 1 : 0;
        }

        for (var i = 0; i < external.Length; i++)
        {
            if (double.IsFinite(external[i]) && (extreme < 0 || Math.Abs(external[i]) > Math.Abs(external[extreme])))
            {
                extreme = i;
            }
        }

        if (extreme < 0)
        {
            return [];
        }

        // |t| at which 2·P(T > |t|)·screened = 1, lowered by a margin so no row with adjusted p below one is missed
        var threshold = 0.999 * StudentT.InvCDF(0, 1, residualDf - 1, 1 - (0.5 / screened));
        threshold = double.IsFinite(threshold) ? threshold : 0;
        var result = new List<(int, double, double)>();
        for (var i = 0; i < external.Length; i++)
        {
            var t = external[i];
            if (!double.IsFinite(t) || (i != extreme && !(Math.Abs(t) >= threshold)))
            {
                continue;
            }

            var p = 2 * StudentT.CDF(0, 1, residualDf - 1, -Math.Abs(t));
            var adjusted = Math.Min(1, p * screened);
            if (adjusted < 1 || i == extreme)
            {
                result.Add((i, t, adjusted));
            }
        }

        return [.. result.OrderBy(r => r.Item3).ThenByDescending(r => Math.Abs(r.Item2))];
    }
}
