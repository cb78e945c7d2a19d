using CellCheck.Core.Cells;
using CellCheck.Core.Data;

namespace CellCheck.Core.Tests.Cells;

public sealed class CellPartitionTests
{
    internal static FactorColumn Factor(string name, string[] levels, params int[] codes) => new(name, levels, codes);

    [Fact]
    public void Rows_are_grouped_by_identical_factor_settings_in_level_order()
    {
        var a = Factor("a", ["lo", "hi"], 1, 0, 1, 0, 1);
        var b = Factor("b", ["x", "y"], 0, 0, 1, 0, 0);
        var p = CellPartition.Build([a, b], [1, 2, 3, 4, 5]);
        Assert.Equal(3, p.CellCount);
        Assert.Equal(["lo", "x"], p.Levels(0));
        Assert.Equal([2.0, 4.0], p.Values.Group(0).ToArray());
        Assert.Equal(["hi", "x"], p.Levels(1));
        Assert.Equal([1.0, 5.0], p.Values.Group(1).ToArray());
        Assert.Equal(["hi", "y"], p.Levels(2));
        Assert.Equal([0, 4], p.RowOrder[2..4]);
    }

    [Fact]
    public void Rows_without_a_value_or_a_level_are_left_out()
    {
        var a = Factor("a", ["p", "q"], 0, FactorColumn.Missing, 1, 1);
        var p = CellPartition.Build([a], [1, 2, double.NaN, 4]);
        Assert.Equal(2, p.Values.Count);
        Assert.Equal([0, 3], p.RowOrder);
    }

    [Fact]
    public void The_census_lists_empty_combinations_and_singletons()
    {
        var a = Factor("a", ["1", "2"], 0, 0, 0, 1);
        var b = Factor("b", ["x", "y"], 0, 0, 1, 0);
        var census = CensusBuilder.Build(CellPartition.Build([a, b], [1, 2, 3, 4]));
        Assert.Equal(3, census.Cells);
        Assert.Equal(4, census.Combinations);
        Assert.Equal(1, census.EmptyCount);
        Assert.Equal(["2", "y"], Assert.Single(census.Empty));
        Assert.Equal(2, census.Singletons);
        Assert.False(census.Balanced);
        Assert.Equal((1, 2), (census.MinReplicates, census.MaxReplicates));
    }

    [Fact]
    public void A_large_factorial_space_uses_the_hashed_path_with_the_same_order()
    {
        var levels = Enumerable.Range(0, 5000).Select(i => i.ToString(System.Globalization.CultureInfo.InvariantCulture)).ToArray();
        var a = Factor("a", levels, 4999, 3, 4999, 0);
        var b = Factor("b", levels, 7, 1, 7, 2);
        var p = CellPartition.Build([a, b], [1, 2, 3, 4]);
        Assert.Equal(3, p.CellCount);
        Assert.Equal(["0", "2"], p.Levels(0));
        Assert.Equal(["4999", "7"], p.Levels(2));
        Assert.Equal(2, p.Size(2));
        var census = CensusBuilder.Build(p);
        Assert.Equal(25_000_000 - 3, census.EmptyCount);
        Assert.Equal(CensusBuilder.EmptyListLimit, census.Empty.Count);
        Assert.True(census.EmptyListTruncated);
    }
}
