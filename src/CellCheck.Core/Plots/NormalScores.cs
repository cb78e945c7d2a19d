using CellCheck.Core.Statistics;

namespace CellCheck.Core.Plots;

/// <summary>
/// Plotting positions of a normal QQ plot: Blom's (1958) approximation to the expected normal order statistics,
/// m_i = Φ⁻¹((i − 3/8)/(n + 1/4)), i = 1..n — the same scores the Shapiro-Wilk weights start from
/// (see <c>ShapiroWilkCoefficients</c>).
/// </summary>
public static class NormalScores
{
    /// <summary>The Blom score of rank <paramref name="rank"/> (0-based) of n, for plotting a few ranks of a large sample.</summary>
    public static double At(int n, int rank) => StandardNormal.Quantile((rank + 1 - 0.375) / (n + 0.25));

    /// <summary>The n Blom scores in increasing order.</summary>
    public static double[] Blom(int n)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(n);
        var m = new double[n];
        for (var i = 0; i < n; i++)
        {
            m[i] = At(n, i);
        }

        // exact symmetry, so the middle score of an odd n is 0 and pairs mirror to the last bit
        for (var i = 0; i < n / 2; i++)
        {
            m[n - 1 - i] = -m[i];
        }

        if (n % 2 == 1)
        {
            m[n / 2] = 0.0;
        }

        return m;
    }
}
