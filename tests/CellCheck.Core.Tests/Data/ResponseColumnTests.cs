using CellCheck.Core.Data;

namespace CellCheck.Core.Tests.Data;

/// <summary>A response column handed over to its partition reads back the values it was made from (common practice,
/// no source: a lossless change of storage).</summary>
public sealed class ResponseColumnTests
{
    [Fact]
    public void A_column_split_into_cells_reads_back_every_value_including_rows_left_out_of_the_cells()
    {
        const int n = 500;
        var random = new Random(8);
        var values = Enumerable.Range(0, n).Select(i => i % 37 == 0 ? double.NaN : random.NextDouble() * 100).ToArray();
        var factor = new FactorColumn("f", ["a", "b", "c"], Enumerable.Range(0, n).Select(i => i % 41 == 5 ? FactorColumn.Missing : random.Next(3)).ToArray());
        var block = new FactorColumn("day", ["1", "2"], Enumerable.Range(0, n).Select(i => i % 43 == 7 ? FactorColumn.Missing : i % 2).ToArray());
        var column = new ResponseColumn("y", null, 0, (double[])values.Clone());

        var partition = column.PartitionBy([factor], [block]);

        Assert.Equal(values.Select(BitConverter.DoubleToInt64Bits), column.Values.Select(BitConverter.DoubleToInt64Bits));
        Assert.NotSame(column.Values, column.Values); // held grouped: each read writes the file order afresh
        Assert.Same(partition, column.PartitionBy([factor], [block]));
        Assert.Equal(n, column.Length);
        Assert.True(partition.RowOrder.Length < values.Count(v => !double.IsNaN(v))); // rows without a level are left out
    }

    [Fact]
    public void A_split_by_other_columns_is_built_from_the_same_values()
    {
        var values = Enumerable.Range(0, 60).Select(i => (double)i).ToArray();
        var first = new FactorColumn("f", ["a", "b"], Enumerable.Range(0, 60).Select(i => i % 2).ToArray());
        var second = new FactorColumn("g", ["a", "b", "c"], Enumerable.Range(0, 60).Select(i => i % 3).ToArray());
        var column = new ResponseColumn("y", null, 0, values);

        var byFirst = column.PartitionBy([first], []);
        var bySecond = column.PartitionBy([second], []);

        Assert.NotSame(byFirst, bySecond);
        Assert.Equal(3, bySecond.CellCount);
        Assert.Equal(Enumerable.Range(0, 60).Where(i => i % 3 == 1).Select(i => (double)i), bySecond.Values.Group(1).ToArray());
        Assert.Equal(values, column.Values);
    }
}
