using CellCheck.Core.Data;

namespace CellCheck.Core.Tests.Data;

/// <summary>Run positions held as a start and count read back exactly as the array they stand for (common practice,
/// no source: a lossless change of storage).</summary>
public sealed class RunPositionsTests
{
    [Theory]
    [InlineData(1.0)]
    [InlineData(-3.0)]
    [InlineData(1.7e9)]
    [InlineData(4e15)]
    public void Positions_one_apart_from_a_whole_number_are_held_without_an_array_and_read_back_unchanged(double first)
    {
        var values = Enumerable.Range(0, 1000).Select(i => first + i).ToArray();

        var positions = RunPositions.From(values);

        Assert.True(positions.IsConsecutive);
        Assert.True(positions.Held.IsEmpty);
        Assert.Equal(values.Select(BitConverter.DoubleToInt64Bits), positions.ToArray().Select(BitConverter.DoubleToInt64Bits));
        Assert.Equal(values[999], positions[999]);
        int[] rows = [999, 0, 17, 17];
        Assert.Equal(rows.Select(r => values[r]), positions.Gather(rows));
        Assert.Equal(values.Skip(300).Take(50), positions.Slice(300, 50).ToArray());
        Assert.Equal(values[349], positions.Slice(300, 50)[49]);
    }

    [Theory]
    [InlineData("a tie", true)]
    [InlineData("a gap", true)]
    [InlineData("a missing position", true)]
    [InlineData("times in whole seconds", true)]
    [InlineData("halves", false)]
    [InlineData("minus zero start", false)]
    [InlineData("beyond 4e15", false)]
    [InlineData("offsets past 32 bits", false)]
    public void Whole_positions_are_held_as_offsets_and_any_others_as_given(string kind, bool whole)
    {
        var values = Enumerable.Range(0, 200).Select(i => kind switch
        {
            "halves" => 0.5 + i,
            "minus zero start" => i == 0 ? -0.0 : i,
            "beyond 4e15" => 5e15 + i,
            "times in whole seconds" => 1.7e9 + (i * 37) - (i % 3),
            "offsets past 32 bits" => i * 3e7,
            _ => 1.0 + i,
        }).ToArray();
        values[150] = kind switch { "a tie" => values[149], "a gap" => values[150] + 1, "a missing position" => double.NaN, _ => values[150] };

        var positions = RunPositions.From(values);

        Assert.False(positions.IsConsecutive);
        Assert.Equal(whole, positions.IsWhole);
        Assert.Equal(values.Select(BitConverter.DoubleToInt64Bits), positions.ToArray().Select(BitConverter.DoubleToInt64Bits));
        Assert.Equal(whole ? [] : values.Select(BitConverter.DoubleToInt64Bits), positions.Held.ToArray().Select(BitConverter.DoubleToInt64Bits));
        Assert.Equal(values.Skip(140).Take(20), positions.Slice(140, 20).ToArray());
        Assert.Equal(values[155], positions.Slice(140, 20)[15]);
    }

    [Fact]
    public void Reading_outside_the_rows_or_a_run_from_an_unusable_start_is_refused()
    {
        var positions = RunPositions.Consecutive(1, 10);
        Assert.Throws<IndexOutOfRangeException>(() => positions[10]);
        Assert.Throws<IndexOutOfRangeException>(() => positions.Slice(5, 5)[5]);
        Assert.Throws<ArgumentOutOfRangeException>(() => positions.Slice(6, 5));
        Assert.Throws<ArgumentOutOfRangeException>(() => RunPositions.Consecutive(0.5, 10));
        Assert.Throws<ArgumentOutOfRangeException>(() => RunPositions.Consecutive(double.NaN, 10));
        Assert.Empty(RunPositions.Consecutive(1, 0).ToArray());
    }
}
