using CellCheck.Core.Data;

namespace CellCheck.Core.Tests.Data;

/// <summary>Narrowed level codes read back exactly as the codes they were made from (common practice, no source:
/// a lossless change of storage width).</summary>
public sealed class LevelCodesTests
{
    [Theory]
    [InlineData(1, 1)]
    [InlineData(254, 1)]
    [InlineData(255, 2)]
    [InlineData(65_534, 2)]
    [InlineData(65_535, 4)]
    [InlineData(200_000, 4)]
    public void Codes_with_missing_rows_read_back_unchanged_at_the_narrowest_width_their_levels_allow(int levels, int width)
    {
        var random = new Random(levels);
        var codes = Enumerable.Range(0, 5_000).Select(i => i % 11 == 0 ? FactorColumn.Missing : random.Next(levels)).ToArray();
        codes[1] = levels - 1; // the largest code is kept too

        var narrow = LevelCodes.From(codes, levels);

        Assert.Equal(width, narrow.Width);
        Assert.Equal(codes.Length, narrow.Length);
        Assert.Equal(codes, narrow.ToArray());
        var rows = new[] { 4, 0, 1, 4999, 11 };
        Assert.Equal(rows.Select(r => codes[r]), narrow.Gather(rows));
    }

    [Fact]
    public void Codes_are_renumbered_through_the_map_while_they_are_narrowed_and_missing_rows_stay_missing()
    {
        var narrow = LevelCodes.From([2, -1, 0, 1, 2], 3, remap: [1, 2, 0]);
        Assert.Equal([0, -1, 1, 2, 0], narrow.ToArray());
    }

    [Fact]
    public void A_code_outside_the_levels_is_a_programming_error()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => LevelCodes.From([0, 3], 3));
        Assert.Throws<ArgumentOutOfRangeException>(() => new FactorColumn("f", ["a"], [0, 1]));
    }
}
