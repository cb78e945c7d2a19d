using CellCheck.Core.Analysis;
using CellCheck.Core.Cells;
using CellCheck.Core.Data;

namespace CellCheck.Core.Tests.Analysis;

/// <summary>The run sequence of the order checks, by each of its three routes, against the definition: rows with a run
/// position and leverage below one, sorted by position, ties in file order.</summary>
public sealed class RunSequenceTests
{
    [Theory]
    [InlineData("sorted")]
    [InlineData("integers")]
    [InlineData("times")]
    public void The_sequence_equals_a_stable_sort_by_run_position(string kind)
    {
        const int n = 500;
        var random = new Random(kind.Length);
        var codes = Enumerable.Range(0, n).Select(_ => random.Next(4)).ToArray();
        var factor = new FactorColumn("f", ["a", "b", "c", "d"], codes);
        var partition = CellPartition.Build([factor], Enumerable.Range(0, n).Select(i => (double)i).ToArray());
        var order = kind switch
        {
            "sorted" => Enumerable.Range(0, n).Select(i => (double)(i / 3)).ToArray(),
            "integers" => Enumerable.Range(0, n).Select(_ => (double)random.Next(n / 2)).ToArray(), // ties
            _ => Enumerable.Range(0, n).Select(_ => 1.7e9 + (random.Next(200) * 0.5)).ToArray(),
        };
        order[7] = double.NaN;
        var leverage = new double[n];
        leverage[11] = 1.0; // a row fitted exactly is left out
        var (use, rows, missing, _) = RunSequence.UsedRows(RunPositions.From(order), partition, leverage);
        var expected = Enumerable.Range(0, n)
            .Where(i => !double.IsNaN(order[partition.RowOrder[i]]) && leverage[i] < 1)
            .OrderBy(i => order[partition.RowOrder[i]]).ThenBy(i => partition.RowOrder[i]).ToArray();
        Assert.Equal(1, missing);
        Assert.Equal(expected, use);
        Assert.Equal(expected.Select(i => partition.RowOrder[i]).ToArray(), Enumerable.Range(0, use.Length).Select(k => rows[k]).ToArray());
    }

    [Fact]
    public void Every_row_used_in_file_order_is_its_own_run_position_without_a_list()
    {
        const int n = 300;
        var random = new Random(3);
        var factor = new FactorColumn("f", ["a", "b", "c"], Enumerable.Range(0, n).Select(_ => random.Next(3)).ToArray());
        var partition = CellPartition.Build([factor], Enumerable.Range(0, n).Select(i => (double)i).ToArray());
        var order = Enumerable.Range(0, n).Select(i => 10.0 + i).ToArray();
        var (use, rows, missing, _) = RunSequence.UsedRows(RunPositions.From(order), partition, null);
        Assert.True(rows.IsIdentity);
        Assert.Equal(0, missing);
        Assert.Equal(Enumerable.Range(0, n), Enumerable.Range(0, n).Select(k => rows[k]));
        Assert.All(Enumerable.Range(0, n), k => Assert.Equal(k, partition.RowOrder[use[k]]));
        Assert.Equal(n - 1, rows[n - 1]);
    }

    [Theory]
    [InlineData("file order")]
    [InlineData("file order, a row without a position")]
    [InlineData("shuffled")]
    [InlineData("numbered runs")]
    public void Residuals_and_cells_in_run_order_are_those_of_each_used_row_by_either_route(string kind)
    {
        const int n = 400;
        var random = new Random(5);
        var factor = new FactorColumn("f", ["a", "b", "c", "d", "e"], Enumerable.Range(0, n).Select(_ => random.Next(5)).ToArray());
        var partition = CellPartition.Build([factor], Enumerable.Range(0, n).Select(i => (double)i).ToArray());
        var residuals = Enumerable.Range(0, n).Select(_ => random.NextDouble()).ToArray();
        var order = Enumerable.Range(0, n).Select(i => kind switch { "shuffled" => random.Next(n), "numbered runs" => i + 1.0, _ => (double)(i / 2) }).ToArray();
        if (kind.EndsWith("position", StringComparison.Ordinal))
        {
            order[17] = double.NaN;
        }

        var ordered = RunOrdering.Of(RunPositions.From(order), partition, residuals, null, wantsCells: true);
        var (use, rows, missing, _) = RunSequence.UsedRows(RunPositions.From(order), partition, null);
        var cellOf = partition.CellOfGroupedIndex();
        Assert.Equal(kind is "file order" or "numbered runs", ordered.Cells is not null && ordered.Use is null);
        Assert.Equal(kind == "numbered runs", ordered.T.IsConsecutive);
        Assert.Equal(missing, ordered.Missing);
        Assert.Equal(use.Select(i => residuals[i]), ordered.E);
        Assert.Equal(use.Select(k => order[partition.RowOrder[k]]), ordered.T.ToArray());
        Assert.Equal(Enumerable.Range(0, use.Length).Select(k => rows[k]), Enumerable.Range(0, use.Length).Select(k => ordered.Rows[k]));
        Assert.Equal(ordered.T.ToArray().Skip(1).Where((v, k) => v == ordered.T[k]).Count(), ordered.Ties);
        var cells = ordered.Cells ?? RunOrderColumns.CellsInRunOrder(partition, ordered.Use!, ordered.Spare!);
        Assert.Equal(use.Select(i => cellOf[i]), cells);
    }

    [Fact]
    public void A_block_contrast_read_in_run_order_into_narrow_codes_equals_the_contrast_of_each_row()
    {
        var random = new Random(6);
        var levels = Enumerable.Range(0, 300).Select(i => $"b{i}").ToArray(); // past one byte a row: two-byte codes
        var block = new FactorColumn("block", levels, Enumerable.Range(0, 1000).Select(_ => random.Next(levels.Length)).ToArray());
        var contrast = Enumerable.Range(0, levels.Length).Select(l => l - 1).ToArray(); // first level: no column
        var sequence = Enumerable.Range(0, 1000).OrderBy(_ => random.Next()).Take(700).ToArray();
        foreach (var rows in new[] { new RunRows(null), new RunRows(sequence) })
        {
            var length = rows.IsIdentity ? 1000 : sequence.Length;
            var codes = LevelCodes.From(new RunContrasts(block.Codes, contrast, rows, length), levels.Length - 1);
            Assert.Equal(2, codes.Width);
            Assert.Equal(Enumerable.Range(0, length).Select(k => contrast[block.Codes[rows[k]]]), Enumerable.Range(0, length).Select(k => codes[k]));
        }
    }
}
