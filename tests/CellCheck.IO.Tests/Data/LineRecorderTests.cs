using CellCheck.IO.Data;

namespace CellCheck.IO.Tests.Data;

/// <summary>The recorded lines are the lines added, in order, whether they were counted or written (common practice,
/// no source: a lossless change of representation).</summary>
public sealed class LineRecorderTests
{
    [Fact]
    public void Consecutive_lines_are_held_as_a_first_line_and_a_count()
    {
        var recorder = new LineRecorder(new ColumnBuffer<int>());
        foreach (var line in Enumerable.Range(2, 1000))
        {
            recorder.Add(line);
        }

        var lines = recorder.Build();
        Assert.True(lines.IsConsecutive);
        Assert.Equal(Enumerable.Range(2, 1000), lines.ToArray());
        Assert.Equal(1001, lines[^1]);
    }

    [Fact]
    public void A_gap_after_a_run_keeps_every_line()
    {
        var recorder = new LineRecorder(new ColumnBuffer<int>());
        int[] added = [2, 3, 4, 6, 7, 9];
        foreach (var line in added)
        {
            recorder.Add(line);
        }

        var lines = recorder.Build();
        Assert.False(lines.IsConsecutive);
        Assert.Equal(added, lines.ToArray());
    }

    [Theory]
    [InlineData(new[] { 2, 3, 4 }, new[] { 5, 6 }, true)] // both runs, joined
    [InlineData(new[] { 2, 3, 4 }, new[] { 6, 7 }, false)] // a blank line between the ranges
    [InlineData(new[] { 2, 4, 5 }, new[] { 6, 7 }, false)] // a gap in the first range
    [InlineData(new[] { 2, 3, 4 }, new[] { 5, 7 }, false)] // a gap in the second range
    [InlineData(new int[0], new[] { 5, 6 }, true)] // an empty first range
    [InlineData(new[] { 2, 3 }, new int[0], true)] // an empty second range
    public void Two_ranges_in_one_reserved_array_join_into_the_lines_of_both(int[] first, int[] second, bool consecutive)
    {
        var array = new int[first.Length + second.Length + 2];
        var one = new LineRecorder(new ColumnBuffer<int>(array, 0, first.Length + 1));
        var two = new LineRecorder(new ColumnBuffer<int>(array, first.Length + 1, second.Length + 1));
        foreach (var line in first)
        {
            one.Add(line);
        }

        foreach (var line in second)
        {
            two.Add(line);
        }

        one.Append(two);
        var lines = one.Build();
        Assert.Equal(consecutive, lines.IsConsecutive);
        Assert.Equal(first.Concat(second), lines.ToArray());
    }
}
