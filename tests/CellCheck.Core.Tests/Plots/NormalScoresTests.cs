using CellCheck.Core.Plots;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Plots;

public sealed class NormalScoresTests
{
    // Reference: Python 3.11 standard library, statistics.NormalDist().inv_cdf((i - 0.375) / (n + 0.25)) for i = 1..n
    // (Wichura's AS 241, relative error about 1e-16). Tolerance 1e-13: two double implementations of the same quantile.
    [Theory]
    [InlineData(5, new[] { -1.1797611176118603, -0.497200570681554, 0.0, 0.497200570681554, 1.1797611176118603 })]
    [InlineData(10, new[] { -1.54663527139923, -1.0004905456193152, -0.6554235052344267, -0.3754617702355184, -0.12258084388880239,
        0.12258084388880253, 0.3754617702355184, 0.6554235052344267, 1.0004905456193152, 1.5466352713992295 })]
    public void Qq_positions_are_the_Blom_plotting_positions(int n, double[] expected)
    {
        var m = NormalScores.Blom(n);
        Assert.Equal(n, m.Length);
        for (var i = 0; i < n; i++)
        {
            Assert.Equal(expected[i], m[i], 1e-13);
        }
    }

    [Theory]
    [InlineData(1)]
    [InlineData(6)]
    [InlineData(37)]
    [InlineData(400)]
    public void Positions_follow_the_formula_and_are_symmetric_and_increasing(int n)
    {
        var m = NormalScores.Blom(n);
        for (var i = 0; i < n; i++)
        {
            Assert.Equal(StandardNormal.Quantile((i + 1 - 0.375) / (n + 0.25)), m[i], 1e-13);
            Assert.Equal(-m[n - 1 - i], m[i]);
            Assert.True(i == 0 || m[i] > m[i - 1]);
        }
    }

    [Theory]
    [InlineData(8)]
    [InlineData(20)]
    [InlineData(51)]
    public void They_are_the_scores_the_Shapiro_Wilk_weights_start_from(int n)
    {
        // Royston's weights are a_i = m_i / sqrt(phi) away from the two outermost, so a_i / m_i is one constant there
        // exactly when the m_i are these Blom scores (the weights are the upper half, largest first).
        var a = ShapiroWilkCoefficients.Compute(n);
        var m = NormalScores.Blom(n);
        var ratios = Enumerable.Range(2, (n / 2) - 2).Select(k => a[k] / m[n - 1 - k]).ToArray();
        Assert.All(ratios, r => Assert.Equal(ratios[0], r, 1e-12));
    }
}
