using CellCheck.Core.Plots;
using MathNet.Numerics.Random;

namespace CellCheck.Core.Tests.Plots;

public sealed class QqEnvelopeTests
{
    [Fact]
    public void The_same_seed_and_size_give_the_same_envelope()
    {
        var a = QqEnvelopes.Simulate(7, 1958);
        var b = QqEnvelopes.Simulate(7, 1958);
        Assert.Equal(a.Lower, b.Lower);
        Assert.Equal(a.Upper, b.Upper);
        Assert.NotEqual(a.Lower, QqEnvelopes.Simulate(7, 1959).Lower);
    }

    [Fact]
    public void With_199_draws_the_band_runs_from_the_5th_to_the_195th_value_and_covers_95_percent()
    {
        var e = QqEnvelopes.Simulate(6, 1);
        Assert.Equal(0.95, e.Coverage, 1e-15);
        Assert.All(Enumerable.Range(0, 6), i => Assert.True(e.Lower[i] < e.Upper[i]));
        Assert.All(Enumerable.Range(1, 5), i => Assert.True(e.Lower[i] > e.Lower[i - 1] && e.Upper[i] > e.Upper[i - 1]));
    }

    /// <summary>
    /// The envelope covers the expected share of fresh normal samples. Each fresh sample (any mean and SD) is sorted,
    /// standardised by its own mean and SD, and compared position by position. Over envelopes from independent seeds
    /// the expected coverage is exactly 190/200 = 0.95 (the rank argument in <see cref="QqEnvelopes"/>). One envelope's
    /// own coverage varies around that with SD about sqrt(0.95 · 0.05 / 201) ≈ 0.015; 20 envelopes × 500 samples × 8
    /// positions put the SD of the average near 0.004, so ±0.015 is almost four SDs.
    /// </summary>
    [Fact]
    public void The_envelope_covers_the_expected_share_of_simulated_samples()
    {
        const int n = 8;
        var random = new Xoshiro256StarStar(20261201, threadSafe: false);
        long inside = 0, total = 0;
        var perPosition = new long[n];
        for (var seed = 0; seed < 20; seed++)
        {
            var envelope = QqEnvelopes.Simulate(n, 1000 + seed);
            for (var s = 0; s < 500; s++)
            {
                var sample = Enumerable.Range(0, n).Select(_ => 10 + (3 * Normal(random))).OrderBy(v => v).ToArray();
                var (mean, sd) = QqEnvelopes.MeanSd(sample);
                var (lower, upper) = envelope.Map(mean, sd);
                for (var i = 0; i < n; i++)
                {
                    var hit = sample[i] >= lower[i] && sample[i] <= upper[i];
                    inside += hit ? 1 : 0;
                    perPosition[i] += hit ? 1 : 0;
                    total++;
                }
            }
        }

        Assert.InRange(inside / (double)total, 0.935, 0.965);
        // each position alone: 10 000 comparisons over 20 envelopes, SD of the share near 0.004
        Assert.All(perPosition, k => Assert.InRange(k / 10000.0, 0.925, 0.975));
    }

    [Fact]
    public void Mapping_scales_the_standardised_band_by_mean_and_sd()
    {
        var e = new QqEnvelope([-1.0, 0.5], [1.0, 2.0], 0.95);
        var (lower, upper) = e.Map(10, 2);
        Assert.Equal([8.0, 11.0], lower);
        Assert.Equal([12.0, 14.0], upper);
    }

    private static double Normal(Random random)
    {
        var u1 = 1.0 - random.NextDouble();
        var u2 = random.NextDouble();
        return Math.Sqrt(-2.0 * Math.Log(u1)) * Math.Cos(2.0 * Math.PI * u2);
    }
}
