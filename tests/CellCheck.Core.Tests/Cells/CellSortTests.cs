using CellCheck.Core.Cells;
using CellCheck.Core.Data;

namespace CellCheck.Core.Tests.Cells;

/// <summary>The counting sort by cell gives one layout whatever the number of row ranges sorted side by side: rows of a
/// cell in file order (a stable sort; common practice, no source).</summary>
public sealed class CellSortTests
{
    [Theory]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    [InlineData(7)]
    public void Sorting_in_row_ranges_gives_the_one_pass_layout(int ranges)
    {
        var random = new Random(ranges);
        const int rows = 50_000;
        const int cells = 37;
        var cellOfRow = Enumerable.Range(0, rows).Select(_ => random.Next(-1, cells)).ToArray();
        var values = Enumerable.Range(0, rows).Select(r => r + 0.5).ToArray();
        var codes = new[] { LevelCodes.From(Enumerable.Range(0, rows).Select(r => r % 5).ToArray(), 5) };

        var one = CellSort.Sort(cellOfRow, cells, values, codes, 1);
        var many = CellSort.Sort(cellOfRow, cells, values, codes, ranges);

        Assert.Equal(one.Starts, many.Starts);
        Assert.Equal(one.RowOrder, many.RowOrder);
        Assert.Equal(one.Grouped, many.Grouped);
        Assert.Equal(one.BlockCodes[0].ToArray(), many.BlockCodes[0].ToArray());
        for (var c = 0; c < cells; c++)
        {
            var members = one.RowOrder[one.Starts[c]..one.Starts[c + 1]];
            Assert.All(members, r => Assert.Equal(c, cellOfRow[r]));
            Assert.Equal(members.Order().ToArray(), members);
        }

        Assert.Equal(cellOfRow.Count(c => c >= 0), one.RowOrder.Length);
    }
}
