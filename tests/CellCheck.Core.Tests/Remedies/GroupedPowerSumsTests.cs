using CellCheck.Core.Remedies;

namespace CellCheck.Core.Tests.Remedies;

/// <summary>
/// The power-sum form of the cell-means Box-Cox profile against the row-by-row form of <see cref="BoxCox"/> on the
/// same data. Tolerance 1e-11 relative on ℓ: both are double-precision evaluations of one quantity; the series is
/// truncated far below rounding (see <see cref="GroupedPowerSums"/>), so what differs is the order of rounding over
/// a few thousand terms (common practice, no source, for comparing two exact formulas in double precision).
/// </summary>
public sealed class GroupedPowerSumsTests
{
    private static (int[] Starts, double[] Logs) Cells(double logSpread, int seed)
    {
        var random = new Random(seed);
        var sizes = new[] { 5, 1, 12, 40, 3, 2, 25, 8 };
        var starts = new int[sizes.Length + 1];
        for (var g = 0; g < sizes.Length; g++)
        {
            starts[g + 1] = starts[g] + sizes[g];
        }

        var logs = new double[starts[^1]];
        for (var g = 0; g < sizes.Length; g++)
        {
            var level = Math.Log(5 + (30 * g));
            for (var i = starts[g]; i < starts[g + 1]; i++)
            {
                logs[i] = level + (logSpread * ((2 * random.NextDouble()) - 1));
            }
        }

        return (starts, logs);
    }

    [Theory]
    [InlineData(0.02)]
    [InlineData(0.3)]
    [InlineData(2.5)] // cells wider than the series' reach at most λ: the row-by-row fallback
    public void The_power_sum_profile_equals_the_row_by_row_profile_over_the_whole_search_range(double logSpread)
    {
        var (starts, logs) = Cells(logSpread, seed: 11);
        var sums = new GroupedPowerSums(starts, logs);
        var rss = new GroupedRss(starts);
        for (var lambda = BoxCox.SearchLower; lambda <= BoxCox.SearchUpper + 1e-9; lambda += 0.25)
        {
            var expected = BoxCox.LogLikelihood(rss, logs, lambda);
            Assert.Equal(expected, sums.LogLikelihood(lambda), Math.Abs(expected) * 1e-11);
        }

        Assert.Equal(BoxCox.LogLikelihood(rss, logs, 0), sums.LogLikelihood(0), Math.Abs(BoxCox.LogLikelihood(rss, logs, 0)) * 1e-11);
        Assert.Equal(BoxCox.LogLikelihood(rss, logs, 1e-9), sums.LogLikelihood(1e-9), Math.Abs(BoxCox.LogLikelihood(rss, logs, 1e-9)) * 1e-11);
    }
}
