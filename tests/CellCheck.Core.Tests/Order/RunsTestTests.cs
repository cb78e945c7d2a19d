using CellCheck.Core.Order;
using CellCheck.Core.Statistics;
using CellCheck.Core.Tests.Statistics;

namespace CellCheck.Core.Tests.Order;

public sealed class RunsTestTests
{
    [Fact]
    public void Earth_density_matches_the_reference_normal_values_and_the_brute_force_exact_p()
    {
        var result = RunsTest.Test(OrderFixtures.Column("earth-density.csv", "density"));

        // reference README (randtests runs.test formula, computed with scipy): median 5.46 dropped, n1 = n2 = 11,
        // 8 runs, expected 12, variance 5.238095238095238, z −1.7477257950106058, two-sided p 0.08051151994050236.
        Assert.Equal((8, 11, 11, 1), (result.Runs, result.N1, result.N2, result.Dropped));
        Assert.Equal(5.46, result.Median);
        Assert.Equal(12.0, result.Expected);
        Close.Relative(5.238095238095238, result.Variance, 1e-15); // 53240/10164 in one division, rounding only
        Close.Relative(-1.7477257950106058, result.Z, 1e-15);
        Close.Relative(0.08051151994050236, result.PNormal, 1e-13); // erfc here, scipy's norm.sf there: ~1e-15 apart
        // R brute force over all C(22, 11) = 705432 placements (Fixtures/order-check-values.R): 0.12693498452012383,
        // = 2 × 44772 / 705432; one rounded division, so 1e-15 relative.
        Close.Relative(0.12693498452012383, result.P, 1e-15);
        Assert.Equal(OrderMethods.Exact, result.Method);
    }

    [Theory]
    [InlineData(5, 4)]
    [InlineData(11, 11)]
    [InlineData(3, 9)]
    [InlineData(1, 6)]
    public void Exact_counts_match_a_brute_force_enumeration_of_arrangements(int n1, int n2)
    {
        var n = n1 + n2;
        var counts = new long[n + 2];
        for (var mask = 0; mask < 1 << n; mask++)
        {
            if (System.Numerics.BitOperations.PopCount((uint)mask) != n2)
            {
                continue;
            }

            var runs = 1;
            for (var i = 1; i < n; i++)
            {
                runs += ((mask >> i) & 1) != ((mask >> (i - 1)) & 1) ? 1 : 0;
            }

            counts[runs]++;
        }

        for (var r = 0; r <= n + 1; r++)
        {
            Assert.Equal(counts[r], RunsDistribution.Count(n1, n2, r));
        }
    }

    [Fact]
    public void Beyond_twenty_on_a_side_the_normal_p_is_reported()
    {
        // 21 below and 21 above the median 0 in alternating pairs: −, −, +, +, … gives 21 runs
        var values = Enumerable.Range(0, 42).Select(i => (i / 2) % 2 == 0 ? -1.0 - i : 1.0 + i).ToArray();

        var result = RunsTest.Test(values);

        Assert.Equal((21, 21, 0), (result.N1, result.N2, result.Dropped));
        Assert.Equal(OrderMethods.NormalApproximation, result.Method);
        Assert.Equal(result.PNormal, result.P);
    }

    [Fact]
    public void Values_on_one_side_only_after_dropping_the_median_are_not_testable()
    {
        var result = RunsTest.Test([1.0, 1.0, 1.0, 2.0]); // median 1: three dropped, nothing below

        Assert.Equal(NotTestableReason.TooFewValues, result.Reason);
        Assert.Equal(3, result.Dropped);
        Assert.Equal(OrderMethods.None, result.Method);
    }
}
