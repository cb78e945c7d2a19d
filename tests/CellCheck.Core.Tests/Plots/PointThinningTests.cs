using CellCheck.Core.Plots;

namespace CellCheck.Core.Tests.Plots;

/// <summary>Thinning of pooled panels with millions of points, and the order-statistic envelope used for them.</summary>
public sealed class PointThinningTests
{
    [Fact]
    public void Small_samples_are_drawn_in_full()
    {
        Assert.Equal(Enumerable.Range(0, 500), PointThinning.Ranks(500));
        Assert.Equal(Enumerable.Range(0, 500), PointThinning.Positions(new double[500], new HashSet<int>()));
    }

    [Fact]
    public void Large_samples_keep_both_tails_and_an_even_spread_of_ranks()
    {
        const int n = 3_000_000;
        var ranks = PointThinning.Ranks(n);
        Assert.True(ranks.Length <= PointThinning.MaxPoints);
        Assert.Equal(Enumerable.Range(0, PointThinning.Extremes), ranks.Take(PointThinning.Extremes));
        Assert.Equal(Enumerable.Range(n - PointThinning.Extremes, PointThinning.Extremes), ranks.TakeLast(PointThinning.Extremes));
        Assert.True(ranks.Zip(ranks.Skip(1)).All(p => p.First < p.Second));
        var gaps = ranks.Zip(ranks.Skip(1)).Select(p => p.Second - p.First).Where(g => g > 1).ToArray();
        Assert.True(gaps.Max() - gaps.Min() <= 1); // evenly spaced in the middle
    }

    [Fact]
    public void Large_scatters_keep_the_most_extreme_points_and_every_point_asked_for()
    {
        var random = new Random(3);
        var ys = Enumerable.Range(0, 100_000).Select(_ => random.NextDouble() - 0.5).ToArray();
        ys[77_777] = 40;
        ys[12_345] = -35;
        var kept = PointThinning.Positions(ys, new HashSet<int> { 4 });
        Assert.True(kept.Length <= PointThinning.MaxPoints + 1);
        Assert.Contains(77_777, kept);
        Assert.Contains(12_345, kept);
        Assert.Contains(4, kept);
        var threshold = ys.Select(Math.Abs).OrderDescending().ElementAt(PointThinning.Extremes - 1);
        Assert.All(Enumerable.Range(0, ys.Length).Where(i => Math.Abs(ys[i]) >= threshold), i => Assert.Contains(i, kept));
    }

    [Fact]
    public void Of_points_equally_far_out_the_earliest_are_kept_first()
    {
        // 1 500 points at |y| = 1 (both signs), the rest near zero: the 1 000 extremes are the first 1 000 of them
        var ys = Enumerable.Range(0, 60_000).Select(i => i % 40 == 7 ? (i % 80 == 7 ? 1.0 : -1.0) : 1e-3 * (i % 13)).ToArray();
        var far = Enumerable.Range(0, ys.Length).Where(i => Math.Abs(ys[i]) == 1.0).ToArray();
        Assert.Equal(1_500, far.Length);
        var kept = PointThinning.Positions(ys, new HashSet<int>()).ToHashSet();
        Assert.All(far.Take(PointThinning.Extremes), i => Assert.Contains(i, kept));
        Assert.Equal(kept.Count, PointThinning.Positions(ys, new HashSet<int>()).Length); // ascending, no repeats
    }

    /// <summary>
    /// The exact order-statistic band against the simulated band at a size where both can be computed (n = 2000).
    /// Tolerance 0.08 in standard units: the simulated band has Monte Carlo error of a few hundredths at 199 draws,
    /// and it standardises each sample by its own mean and SD, which the exact band does not (common practice, no source).
    /// </summary>
    [Fact]
    public void The_order_statistic_band_agrees_with_the_simulated_band()
    {
        const int n = 2000;
        var simulated = QqEnvelopes.Simulate(n, seed: 7);
        var ranks = Enumerable.Range(0, n).Where(i => i % 50 == 0 || i == n - 1).ToArray();
        var exact = QqEnvelopes.OrderStatistics(n, ranks);
        for (var k = 0; k < ranks.Length; k++)
        {
            var tolerance = ranks[k] < 20 || ranks[k] > n - 21 ? 0.3 : 0.08; // the outermost ranks are the noisiest to simulate
            Assert.Equal(simulated.Lower[ranks[k]], exact.Lower[k], tolerance);
            Assert.Equal(simulated.Upper[ranks[k]], exact.Upper[k], tolerance);
        }
    }
}
