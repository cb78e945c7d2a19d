using CellCheck.Core.Cells;
using CellCheck.Core.Data;
using CellCheck.Core.Models;
using CellCheck.Core.Order;
using CellCheck.Core.Remedies;
using CellCheck.Core.Residuals;

namespace CellCheck.Core.Tests.Residuals;

/// <summary>
/// The absorbed fit of cells plus additive blocks against the dense pivoted-QR fit of the same model (itself checked
/// against R's lm in the model tests), on unbalanced designs with one and two block factors. Tolerance 1e-9 relative
/// (1e-9 absolute on residuals of unit scale): both solve the same least-squares problem in double precision, the QR
/// with refinement, the absorption through a small well-conditioned p × p system.
/// </summary>
public sealed class CellBlockResidualsTests
{
    private static (CellPartition Partition, FactorColumn[] Blocks, ModelSpec Spec, double[] Order) Design(int seed, int blockFactors)
    {
        var random = new Random(seed);
        const int n = 420;
        var a = new int[n];
        var b = new int[n];
        var blockCodes = Enumerable.Range(0, blockFactors).Select(_ => new int[n]).ToArray();
        var y = new double[n];
        for (var i = 0; i < n; i++)
        {
            a[i] = i < 12 ? i % 3 : random.Next(3);
            b[i] = i < 12 ? i / 3 : random.Next(4);
            for (var j = 0; j < blockFactors; j++)
            {
                blockCodes[j][i] = i < 12 ? i % (5 + j) : random.Next(5 + j);
            }

            y[i] = 50 + (3 * a[i]) - b[i] + (0.2 * a[i] * b[i]) + (blockFactors > 0 ? 1.5 * blockCodes[0][i] : 0) + Math.Exp(0.3 * random.NextDouble()) + random.NextDouble();
        }

        var factors = new[]
        {
            new FactorColumn("a", ["a1", "a2", "a3"], a),
            new FactorColumn("b", ["b1", "b2", "b3", "b4"], b),
        };
        var blocks = blockCodes.Select((codes, j) => new FactorColumn("block" + j, Enumerable.Range(0, 5 + j).Select(k => "k" + k).ToArray(), codes)).ToArray();
        var order = Enumerable.Range(0, n).Select(i => (double)i).ToArray();
        random.Shuffle(order);
        return (CellPartition.Build(factors, y, blocks), blocks, ModelSpec.Full(2), order);
    }

    [Theory]
    [InlineData(1, 1)]
    [InlineData(2, 2)]
    public void Residuals_fitted_values_leverage_and_both_studentized_residuals_equal_the_dense_fit(int seed, int blockFactors)
    {
        var (partition, blocks, spec, _) = Design(seed, blockFactors);
        var dense = new ModelResiduals(blocks, spec, "m").Compute(partition);
        var absorbed = new CellBlockResiduals(blocks, spec, "m", new ModelResiduals(blocks, spec, "m")).Compute(partition);
        Assert.True(absorbed.Diagnostics!.Model.Absorbed);
        Assert.Equal(dense.ResidualDf, absorbed.ResidualDf);
        Assert.Equal(dense.ResidualSd, absorbed.ResidualSd, 1e-9 * dense.ResidualSd);
        for (var i = 0; i < dense.Residuals.Length; i++)
        {
            Assert.Equal(dense.Residuals[i], absorbed.Residuals[i], 1e-9);
            Assert.Equal(dense.Diagnostics!.Leverage[i], absorbed.Diagnostics.Leverage[i], 1e-9);
            Assert.Equal(dense.Studentized[i], absorbed.Studentized[i], 1e-8);
            Assert.Equal(dense.Diagnostics.CooksDistance[i], absorbed.Diagnostics.CooksDistance[i], 1e-9);
            Assert.Equal(dense.Diagnostics.StudentizedExternal[i], absorbed.Diagnostics.StudentizedExternal[i], 1e-8);
            Assert.Equal(dense.Fitted[i], absorbed.Fitted[i], 1e-9);
        }
    }

    [Fact]
    public void External_studentized_residuals_read_once_are_not_kept_until_per_row_output_asks_for_them()
    {
        var (partition, blocks, spec, _) = Design(4, 1);
        var diagnostics = new CellBlockResiduals(blocks, spec, "m", new ModelResiduals(blocks, spec, "m")).Compute(partition).Diagnostics!;
        var once = diagnostics.StudentizedExternalOnce();
        Assert.NotSame(once, diagnostics.StudentizedExternalOnce());
        var kept = diagnostics.StudentizedExternal;
        Assert.Equal(once, kept);
        Assert.Same(kept, diagnostics.StudentizedExternalOnce());
    }

    [Fact]
    public void Studentized_residuals_given_as_an_array_are_never_handed_out_as_a_readers_own()
    {
        var (partition, blocks, spec, _) = Design(5, 1);
        var given = new ModelResiduals(blocks, spec, "m").Compute(partition);
        Assert.Same(given.Studentized, given.StudentizedOnce(out var owned));
        Assert.False(owned);
        var formed = new CellBlockResiduals(blocks, spec, "m", new ModelResiduals(blocks, spec, "m")).Compute(partition);
        var once = formed.StudentizedOnce(out owned);
        Assert.True(owned);
        Assert.Equal(once, formed.Studentized);
        Assert.NotSame(once, formed.Studentized);
    }

    [Fact]
    public void The_absorbed_fit_residualizes_in_place_to_the_same_values()
    {
        var (partition, blocks, spec, _) = Design(6, 2);
        var fit = new CellBlockResiduals(blocks, spec, "m", new ModelResiduals(blocks, spec, "m")).Compute(partition).Diagnostics!.Absorbed!;
        var y = partition.Values.Values.Select(v => (v * v) - 3).ToArray();
        var apart = new double[y.Length];
        fit.Residualize(y, apart);
        fit.Residualize(y, y);
        Assert.Equal(apart, y);
    }

    [Fact]
    public void Tukeys_test_and_lack_of_fit_equal_the_dense_fit()
    {
        var (partition, blocks, spec, _) = Design(3, 1);
        var dense = new ModelResiduals(blocks, spec, "m").Compute(partition);
        var absorbed = new CellBlockResiduals(blocks, spec, "m", new ModelResiduals(blocks, spec, "m")).Compute(partition);
        var denseTukey = TukeyNonadditivity.Test(dense.Diagnostics!.Estimable!, dense.Diagnostics.Fit!);
        var rss = absorbed.ResidualSd * absorbed.ResidualSd * absorbed.ResidualDf;
        var tukey = TukeyNonadditivity.Test(absorbed.Residuals, partition.Values.Values, rss, absorbed.ResidualDf, absorbed.Diagnostics!.Absorbed!);
        Assert.Equal(denseTukey.Statistic, tukey.Statistic, 1e-9 * denseTukey.Statistic);
        Assert.Equal(denseTukey.P, tukey.P, 1e-9);
        var (settings, _) = SettingGroups.Of(partition, blocks);
        var denseLack = LackOfFit.Test(dense.Diagnostics.Fit!, partition.Values.Values, settings);
        var lack = LackOfFit.Test(absorbed.ResidualDf, rss, partition.Values.Values, settings);
        Assert.Equal(denseLack.Statistic, lack.Statistic, 1e-9 * denseLack.Statistic);
    }

    [Theory]
    [InlineData(4, 1)]
    [InlineData(5, 2)]
    public void Durbin_Watson_moments_equal_the_dense_trace_computation(int seed, int blockFactors)
    {
        var (partition, blocks, spec, order) = Design(seed, blockFactors);
        var absorbed = new CellBlockResiduals(blocks, spec, "m", new ModelResiduals(blocks, spec, "m")).Compute(partition);
        var dense = new ModelResiduals(blocks, spec, "m").Compute(partition);
        var run = Enumerable.Range(0, partition.RowOrder.Length).OrderBy(i => order[partition.RowOrder[i]]).ToArray();
        var e = run.Select(i => absorbed.Residuals[i]).ToArray();
        var estimable = dense.Diagnostics!.Estimable!;
        var x = new double[run.Length, estimable.GetLength(1)];
        for (var k = 0; k < run.Length; k++)
        {
            for (var j = 0; j < x.GetLength(1); j++)
            {
                x[k, j] = estimable[run[k], j];
            }
        }

        var expected = DurbinWatson.Test(e, x, DurbinWatsonAlternative.Positive, exactLimit: 0);
        var cells = partition.CellOfGroupedIndex();
        var fit = absorbed.Diagnostics!.Absorbed!;
        var actual = CellBlockDurbinWatson.Test(e, run.Select(i => cells[i]).ToArray(), partition.CellCount,
            partition.GroupedCodes(blocks).Select((codes, j) => LevelCodes.From(run.Select(i => fit.LevelColumns[j][codes[i]]).ToArray(), fit.P)).ToArray(), fit.P)!;
        Assert.Equal(expected.ExpectedD, actual.ExpectedD, 1e-9 * expected.ExpectedD);
        Assert.Equal(expected.VarianceD, actual.VarianceD, 1e-9 * expected.VarianceD);
        Assert.Equal(expected.P, actual.P, 1e-9);
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    public void The_Box_Cox_profile_by_settings_equals_the_plain_one_group_at_a_time_profile_bit_for_bit(int blockFactors)
    {
        var (partition, blocks, _, _) = Design(7, blockFactors);
        var settings = SettingRss.Build(partition, blocks)!;
        var logs = Array.ConvertAll(settings.Order.Permutation(), i => Math.Log(partition.Values.Values[i]));
        var sums = new GroupedPowerSums(settings.Starts, logs, settings.Between);
        var plain = new Remedies.PlainGroupedProfile(settings.Starts, logs, settings.Between);
        foreach (var lambda in new[] { -5, -2.0, -0.5, 0.0, 1e-9, 0.3, 1.0, 2.5, 5 })
        {
            Assert.Equal(plain.LogLikelihood(lambda), sums.LogLikelihood(lambda));
        }
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    public void The_setting_order_is_a_stable_sort_of_the_grouped_positions_by_setting_and_the_logs_follow_it(int blockFactors)
    {
        var (partition, blocks, _, _) = Design(9, blockFactors);
        var settings = SettingRss.Build(partition, blocks)!;
        var (setting, _) = SettingGroups.Of(partition, blocks);
        var expected = Enumerable.Range(0, setting.Length).OrderBy(i => setting[i]).ThenBy(i => i).ToArray();
        Assert.Equal(expected, settings.Order.Permutation());
        var y = partition.Values.Values;
        var source = new SettingLogs<ShiftedValues>(new ShiftedValues(y, 0), settings.Order);
        var logs = new double[source.Count];
        Assert.True(source.TryFill(0, logs));
        Assert.Equal(expected.Select(i => Math.Log(y[i])), logs);
        foreach (var (from, length) in new[] { (1, 7), (13, 40), (logs.Length - 5, 5), (logs.Length / 3, logs.Length / 3) })
        {
            var part = new double[length]; // a range that starts and ends inside cells
            Assert.True(source.TryFill(from, part));
            Assert.Equal(logs[from..(from + length)], part);
        }

        for (var g = 0; g < settings.Starts.Length - 1; g++)
        {
            Assert.All(expected[settings.Starts[g]..settings.Starts[g + 1]], i => Assert.Equal(g, setting[i]));
        }
    }

    [Fact]
    public void The_logs_in_setting_order_name_the_first_value_in_that_order_that_is_not_positive()
    {
        var (partition, blocks, _, _) = Design(9, 1);
        var settings = SettingRss.Build(partition, blocks)!;
        var order = settings.Order.Permutation();
        var y = (double[])partition.Values.Values.Clone();
        var (first, second) = (order[^3], order[5]);
        y[first] = -1;
        y[second] = 0;
        var source = new SettingLogs<ShiftedValues>(new ShiftedValues(y, 0), settings.Order);
        Assert.False(source.TryFill(0, new double[source.Count]));
        var error = Assert.Throws<ArgumentException>(() => new GroupedPowerSums(settings.Starts, source, settings.Between));
        Assert.StartsWith($"Box-Cox needs positive finite values; value {second} is 0", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void The_Box_Cox_profile_by_settings_equals_the_dense_profile()
    {
        var (partition, blocks, spec, _) = Design(6, 1);
        var dense = new ModelResiduals(blocks, spec, "m").Compute(partition);
        var settings = SettingRss.Build(partition, blocks)!;
        var y = partition.Values.Values;
        var logs = y.Select(v => Math.Log(v)).ToArray();
        var sums = new GroupedPowerSums(settings.Starts, Array.ConvertAll(settings.Order.Permutation(), i => logs[i]), settings.Between);
        Assert.Equal(dense.ResidualDf, settings.ResidualDf);
        foreach (var lambda in new[] { -2.0, -0.5, 0.0, 0.3, 1.0, 2.5 })
        {
            var expected = BoxCox.LogLikelihood(dense.Diagnostics!.Estimable!, y, lambda);
            Assert.Equal(expected, sums.LogLikelihood(lambda), Math.Abs(expected) * 1e-10);
        }

        var rss = dense.ResidualSd * dense.ResidualSd * dense.ResidualDf;
        Assert.Equal(rss, settings.Of(y), rss * 1e-9);
    }

    [Fact]
    public void A_block_with_one_level_has_no_contrasts_and_Durbin_Watson_is_that_of_the_cells()
    {
        var random = new Random(8);
        const int n = 300;
        var cell = Enumerable.Range(0, n).Select(t => t < 6 ? t : random.Next(6)).ToArray();
        var residuals = Enumerable.Range(0, n).Select(_ => random.NextDouble() - 0.5).ToArray();
        var noContrast = new[] { LevelCodes.From(Enumerable.Repeat(-1, n).ToArray(), 0) };
        var blocked = CellBlockDurbinWatson.Test(residuals, cell, 6, noContrast, 0)!;
        var grouped = GroupedDurbinWatson.Test(residuals, cell, 6);
        Assert.Equal(grouped, blocked);
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)] // clean data: only the extreme row, below every threshold, is named
    public void The_outlier_screen_formed_cell_by_cell_names_the_rows_of_the_screen_of_the_stored_column(bool grossErrors)
    {
        // 300 000 rows in 60 cells: several ranges of cells side by side; a dozen gross errors spread over the cells
        // (common practice, no source: the streamed screen must be the stored one, row for row and bit for bit)
        var random = new Random(77);
        const int n = 300_000;
        var (a, b, day, y) = (new int[n], new int[n], new int[n], new double[n]);
        for (var i = 0; i < n; i++)
        {
            (a[i], b[i], day[i]) = (random.Next(6), random.Next(10), random.Next(8));
            y[i] = 20 + a[i] - (0.5 * b[i]) + (0.3 * day[i]) + NormalDraw(random);
        }

        foreach (var row in grossErrors ? new[] { 17, 40_001, 99_999, 150_000, 222_222, 299_990, 5, 77_777, 123_456, 250_000, 3, 180_000 } : [])
        {
            y[row] += (row % 2 == 0 ? 1 : -1) * (5.5 + (row % 7));
        }

        var factors = new[]
        {
            new FactorColumn("a", Enumerable.Range(0, 6).Select(k => "a" + k).ToArray(), a),
            new FactorColumn("b", Enumerable.Range(0, 10).Select(k => "b" + k).ToArray(), b),
        };
        var blocks = new[] { new FactorColumn("day", Enumerable.Range(0, 8).Select(k => "d" + k).ToArray(), day) };
        var partition = CellPartition.Build(factors, y, blocks);
        var residuals = new CellBlockResiduals(blocks, ModelSpec.Full(2), "m", new ModelResiduals(blocks, ModelSpec.Full(2), "m")).Compute(partition);
        var diagnostics = residuals.Diagnostics!;

        var stored = OutlierScreen.Screen(diagnostics.StudentizedExternal, residuals.ResidualDf, out var storedCount);
        Assert.True(grossErrors ? stored.Count >= 10 : stored.Count == 1, $"the screen named {stored.Count} rows");
        // one pass with the expected count (every leverage below one), and the second pass an expectation above the
        // true count calls for
        foreach (var leverageOne in new[] { 0, -5 })
        {
            var streamed = diagnostics.Cases!.ScreenExternal(residuals.ResidualDf, leverageOne, out var streamedCount);
            Assert.Equal(storedCount, streamedCount);
            Assert.Equal(stored, streamed);
        }
    }

    private static double NormalDraw(Random random) =>
        Math.Sqrt(-2 * Math.Log(1 - random.NextDouble())) * Math.Cos(2 * Math.PI * random.NextDouble());
}
