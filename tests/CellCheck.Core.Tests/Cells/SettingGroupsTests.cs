using CellCheck.Core.Cells;
using CellCheck.Core.Data;
using CellCheck.Core.Remedies;

namespace CellCheck.Core.Tests.Cells;

/// <summary>
/// The identical-settings groups (cell and block levels) of long and short partitions, against one plain pass that
/// numbers each cell's block-level combinations in order of first appearance, cells in order (the definition; common
/// practice, no source). Whole numbers: compared exactly.
/// </summary>
public sealed class SettingGroupsTests
{
    [Theory]
    [InlineData(1, 200_000)]
    [InlineData(2, 150_000)]
    [InlineData(1, 5_000)]
    public void Settings_are_numbered_by_first_appearance_within_each_cell_cells_in_order(int blockFactors, int rows)
    {
        var random = new Random(blockFactors + rows);
        FactorColumn Column(string name, int levels, Func<int, int> code)
        {
            var codes = Enumerable.Range(0, rows).Select(code).ToArray();
            return new FactorColumn(name, Enumerable.Range(0, levels).Select(l => $"{name}{l}").ToArray(), LevelCodes.From(codes, levels), null);
        }

        var factors = new[] { Column("a", 30, _ => random.Next(30)), Column("b", 11, _ => random.Next(11)) };
        var blocks = Enumerable.Range(0, blockFactors)
            .Select(j => Column($"day{j}", 7 + j, r => j == 0 ? r * 7 / rows : random.Next(8))) // stretches, then scattered
            .ToArray();
        var values = Enumerable.Range(0, rows).Select(_ => random.NextDouble()).ToArray();
        var partition = CellPartition.Build(factors, values, blocks);

        var (settings, count) = SettingGroups.Of(partition, blocks);

        var expected = new int[partition.RowOrder.Length];
        var next = 0;
        for (var c = 0; c < partition.CellCount; c++)
        {
            var seen = new Dictionary<string, int>();
            for (var i = partition.Values.Starts[c]; i < partition.Values.Starts[c + 1]; i++)
            {
                var row = partition.RowOrder[i];
                var key = string.Join(",", blocks.Select(b => b.Codes[row]));
                if (!seen.TryGetValue(key, out var g))
                {
                    seen[key] = g = next++;
                }

                expected[i] = g;
            }
        }

        Assert.Equal(next, count);
        Assert.Equal(expected, settings);

        // the Box-Cox fits' organisation of the same settings (counted by ranges of cells side by side on long data)
        var organised = SettingRss.Build(partition, blocks)!;
        var sizes = new int[count];
        foreach (var g in expected)
        {
            sizes[g]++;
        }

        Assert.Equal(sizes, Enumerable.Range(0, count).Select(g => organised.Starts[g + 1] - organised.Starts[g]));
    }
}
