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

    /// <summary>Many groups of 0 to 9 rows (a count that is not a multiple of the block width, over several parallel
    /// ranges), group levels far apart so that the shifts take both routes of expm1.</summary>
    private static (int[] Starts, double[] Logs) ManyGroups(double logSpread, int seed)
    {
        var random = new Random(seed);
        var starts = new int[5003 + 1];
        for (var g = 0; g < starts.Length - 1; g++)
        {
            starts[g + 1] = starts[g] + random.Next(10);
        }

        var logs = new double[starts[^1]];
        for (var g = 0; g < starts.Length - 1; g++)
        {
            var level = 3 * random.NextDouble();
            for (var i = starts[g]; i < starts[g + 1]; i++)
            {
                logs[i] = level + (logSpread * ((2 * random.NextDouble()) - 1));
            }
        }

        return (starts, logs);
    }

    [Theory]
    [InlineData(0.01)]
    [InlineData(0.3)]
    [InlineData(0.9)] // wider than the series' reach at the ends of the range: the row-by-row route in some lanes
    public void The_vectorised_profile_equals_the_plain_one_group_at_a_time_profile_bit_for_bit(double logSpread)
    {
        var (starts, logs) = ManyGroups(logSpread, seed: 5);
        var sums = new GroupedPowerSums(starts, logs);
        var plain = new PlainGroupedProfile(starts, logs);
        foreach (var lambda in new[] { -5, -3.7, -1, -1e-9, 0, -0.0, 1e-9, 0.25, 0.97251828, 1, 2.5, 5 })
        {
            Assert.Equal(plain.LogLikelihood(lambda), sums.LogLikelihood(lambda));
        }
    }

    [Theory]
    [InlineData(0.01)]
    [InlineData(0.9)]
    public void The_power_sums_of_each_group_equal_the_plain_row_by_row_loop_bit_for_bit(double logSpread)
    {
        var (starts, logs) = ManyGroups(logSpread, seed: 9);
        var table = new PowerSumTable(starts, new HeldLogs(logs));
        var sumLog = default(Core.Statistics.NeumaierSum);
        for (var g = 0; g < table.Groups; g++)
        {
            var groupSum = 0.0;
            foreach (var l in logs.AsSpan(starts[g], starts[g + 1] - starts[g]))
            {
                groupSum += l;
            }

            sumLog.Add(groupSum);
        }

        Assert.Equal(sumLog.Value, table.SumLog);
        for (var g = 0; g < table.Groups; g++)
        {
            var cell = logs.AsSpan(starts[g], starts[g + 1] - starts[g]);
            var centre = cell.IsEmpty ? 0 : Core.Statistics.Descriptive.Mean(cell);
            var terms = cell.IsEmpty ? 0 : GroupedPowerSums.TermsWithin(cell.Length, cell.ToArray().Max(l => Math.Abs(l - centre)));
            Assert.Equal(centre, table.Centre[g]);
            Assert.Equal(terms, table.Terms[g]);
            var expected = new double[terms + 1];
            foreach (var l in cell)
            {
                var e = l - centre;
                var power = e;
                for (var k = 1; k <= terms; k++)
                {
                    expected[k] += power;
                    power *= e;
                }
            }

            var factorial = 1.0;
            for (var k = 1; k <= terms; k++)
            {
                factorial *= k;
                Assert.Equal(expected[k] / factorial, table.BlockSums(g / PowerSumTable.Lanes)[(g % PowerSumTable.Lanes) + ((k - 1) * PowerSumTable.Lanes)]);
            }
        }
    }

    [Fact]
    public void The_vector_expm1_series_equals_the_scalar_one_bit_for_bit()
    {
        var random = new Random(8);
        var x = Enumerable.Range(0, 64).Select(k => k < 4 ? new[] { 0, -0.0, 1e-300, -0.4999999 }[k] : random.NextDouble() - 0.5).ToArray();
        var actual = new double[x.Length];
        PreciseMath.ExpM1Near(x, actual);
        for (var i = 0; i < x.Length; i++)
        {
            Assert.Equal(PreciseMath.ExpM1(x[i]), actual[i]);
        }

        foreach (var v in new[] { 0.5, -0.7, 3, -40, 700, 1e-20 })
        {
            Assert.Equal(PreciseMath.ExpM1(v), PreciseMath.ExpM1(v, Math.Exp(v)));
        }
    }

    [Fact]
    public void Only_groups_whose_logs_reach_beyond_a_fifth_keep_them_for_row_by_row_evaluation()
    {
        // reach 0.1, 0.3 and 0.2 exactly (5 × 0.2 = 1 is still inside the series' reach), then an empty group
        double[] logs = [1.0, 1.1, 0.9, 2.0, 2.3, 1.7, 3.0, 3.2, 2.8];
        int[] starts = [0, 3, 6, 9, 9];
        var reach = new double[] { 0.1, 0.3, 0.2, 0 };
        Assert.Equal([false, true, false, false], reach.Select(KeptLogs.Far));
        var kept = new KeptLogs([null, [2.0, 2.3, 1.7], null, null]);
        Assert.Equal(3, kept.Count);
        Assert.Equal(new[] { 2.0, 2.3, 1.7 }, kept.Of(1, 3).ToArray());
        Assert.Throws<InvalidOperationException>(() => kept.Of(0, 3).Length);
        Assert.Throws<InvalidOperationException>(() => kept.Of(2, 3).Length);

        // the table keeps the logs of exactly the groups its reaches call far, formed range by range
        var (many, manyLogs) = ManyGroups(0.9, seed: 12);
        var table = new PowerSumTable(many, new HeldLogs(manyLogs));
        var far = Enumerable.Range(0, table.Groups).Where(g => KeptLogs.Far(table.Reach[g])).ToArray();
        Assert.NotEmpty(far);
        Assert.Equal(far.Sum(g => many[g + 1] - many[g]), table.Kept.Count);
        Assert.All(far, g => Assert.Equal(manyLogs[many[g]..many[g + 1]], table.Kept.Of(g, many[g + 1] - many[g]).ToArray()));
    }

    [Fact]
    public void The_profile_is_evaluated_only_inside_the_search_range()
    {
        var (starts, logs) = Cells(0.02, seed: 4);
        var sums = new GroupedPowerSums(starts, logs);
        _ = sums.LogLikelihood(BoxCox.SearchLower);
        _ = sums.LogLikelihood(BoxCox.SearchUpper);
        Assert.Throws<ArgumentOutOfRangeException>(() => sums.LogLikelihood(BoxCox.SearchUpper + 0.01));
        Assert.Throws<ArgumentOutOfRangeException>(() => sums.LogLikelihood(BoxCox.SearchLower - 0.01));
    }

    [Fact]
    public void Evaluations_side_by_side_give_the_values_of_evaluations_one_at_a_time_bit_for_bit()
    {
        var (starts, logs) = ManyGroups(0.9, seed: 12);
        var lambdas = Enumerable.Range(0, 81).Select(k => -5 + (k * 0.125)).ToArray();
        var alone = new GroupedPowerSums(starts, logs);
        var expected = lambdas.Select(alone.LogLikelihood).ToArray();
        var shared = new GroupedPowerSums(starts, logs);
        var actual = new double[lambdas.Length];
        Parallel.For(0, lambdas.Length, new ParallelOptions { MaxDegreeOfParallelism = 4 }, k => actual[k] = shared.LogLikelihood(lambdas[k]));
        Assert.Equal(expected, actual);
    }

    [Fact]
    public void A_profile_scanned_and_bounded_side_by_side_has_the_same_maximum_and_interval_as_one_scanned_alone()
    {
        var (starts, logs) = ManyGroups(0.3, seed: 13);
        var sums = new GroupedPowerSums(starts, logs);
        var alone = ProfileLikelihood.Maximise(sums.LogLikelihood, BoxCox.SearchLower, BoxCox.SearchUpper, ProfileLikelihood.CoarseStep);
        var sideBySide = ProfileLikelihood.Maximise(sums.LogLikelihood, BoxCox.SearchLower, BoxCox.SearchUpper, ProfileLikelihood.CoarseStep, sideBySide: true);
        Assert.Equal(alone, sideBySide);
        Assert.NotNull(alone.Lower);
        Assert.NotNull(alone.Upper);
    }
}
