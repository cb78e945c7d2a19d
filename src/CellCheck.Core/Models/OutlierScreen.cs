using MathNet.Numerics.Distributions;

namespace CellCheck.Core.Models;

/// <summary>
/// Screens externally studentized residuals for outliers: under normal errors t_i follows Student's t with ν − 1
/// degrees of freedom (Belsley, Kuh &amp; Welsch 1980); the two-sided p of the largest |t_i| is multiplied by the
/// number of residuals screened (Bonferroni bound), so the chance of naming any row on clean data is at most alpha.
/// Skipped when fewer than 3 residual degrees of freedom remain. The parts (<see cref="Extreme"/>,
/// <see cref="Threshold"/>, <see cref="Candidate"/>, <see cref="Ranked"/>) also serve a screen over values formed
/// range by range, which then names the same rows.
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

        var (count, extreme) = Extreme(external, 0);
        screened = count;
        if (extreme < 0)
        {
            return [];
        }

        var threshold = Threshold(screened, residualDf);
        var result = new List<(int, double, double)>();
        for (var i = 0; i < external.Length; i++)
        {
            if (Candidate(i, external[i], extreme, threshold, screened, residualDf) is { } candidate)
            {
                result.Add(candidate);
            }
        }

        return Ranked(result);
    }

    /// <summary>The number of finite values and the row of the first largest |t| among them (−1 when none), rows
    /// numbered from <paramref name="offset"/>.</summary>
    public static (int Finite, int Row) Extreme(ReadOnlySpan<double> external, int offset)
    {
        var finite = 0;
        var extreme = -1;
        for (var i = 0; i < external.Length; i++)
        {
            if (double.IsFinite(external[i]))
            {
                finite++;
                if (extreme < 0 || Math.Abs(external[i]) > Math.Abs(external[extreme]))
                {
                    extreme = i;
                }
            }
        }

        return (finite, extreme < 0 ? -1 : offset + extreme);
    }

    /// <summary>|t| at which 2·P(T &gt; |t|)·screened = 1, lowered by a margin so no row with adjusted p below one is missed.</summary>
    public static double Threshold(int screened, int residualDf)
    {
        var threshold = 0.999 * StudentT.InvCDF(0, 1, residualDf - 1, 1 - (0.5 / screened));
        return double.IsFinite(threshold) ? threshold : 0;
    }

    /// <summary>Row <paramref name="row"/> with its adjusted p when it is named (adjusted p below one, or the extreme row).</summary>
    public static (int Row, double T, double PAdjusted)? Candidate(int row, double t, int extreme, double threshold, int screened, int residualDf)
    {
        if (!double.IsFinite(t) || (row != extreme && !(Math.Abs(t) >= threshold)))
        {
            return null;
        }

        var p = 2 * StudentT.CDF(0, 1, residualDf - 1, -Math.Abs(t));
        var adjusted = Math.Min(1, p * screened);
        return adjusted < 1 || row == extreme ? (row, t, adjusted) : null;
    }

    /// <summary>The named rows (given in row order) by adjusted p, then by |t| from the largest.</summary>
    public static IReadOnlyList<(int Row, double T, double PAdjusted)> Ranked(List<(int Row, double T, double PAdjusted)> named) =>
        [.. named.OrderBy(r => r.PAdjusted).ThenByDescending(r => Math.Abs(r.T))];
}
