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
        var (use, rows, missing, _) = RunSequence.UsedRows(order, partition, leverage);
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
        var (use, rows, missing, _) = RunSequence.UsedRows(order, partition, null);
        Assert.True(rows.IsIdentity);
        Assert.Equal(0, missing);
        Assert.Equal(Enumerable.Range(0, n), Enumerable.Range(0, n).Select(k => rows[k]));
        Assert.All(Enumerable.Range(0, n), k => Assert.Equal(k, partition.RowOrder[use[k]]));
        Assert.Equal(n - 1, rows[n - 1]);
    }
}
