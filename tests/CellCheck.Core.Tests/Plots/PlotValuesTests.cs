using CellCheck.Core.Plots;

namespace CellCheck.Core.Tests.Plots;

/// <summary>The panels' gathered values and their range, against LINQ's Select, Min and Max (common practice, no source).</summary>
public sealed class PlotValuesTests
{
    [Fact]
    public void Gathered_values_and_their_range_are_what_select_min_and_max_give()
    {
        var random = new Random(7);
        var values = Enumerable.Range(0, 1000).Select(_ => Math.Round(random.NextDouble() * 20 - 10, 1)).ToArray();
        var rows = Enumerable.Range(0, 300).Select(_ => random.Next(values.Length)).ToArray();
        var gathered = PlotValues.Gather(values, rows);
        Assert.Equal(rows.Select(r => values[r]), gathered);
        Assert.Equal((gathered.Min(), gathered.Max()), PlotValues.Range(gathered));
        Assert.Equal((gathered.Min(), gathered.Max()), PlotValues.Range(values, rows));
    }

    [Fact]
    public void Of_equal_extremes_the_first_is_kept_as_min_and_max_keep_it()
    {
        double[] values = [-0.0, 0.0, 0.0, -0.0];
        var (low, high) = PlotValues.Range(values);
        Assert.True(double.IsNegative(low) && double.IsNegative(high));
        Assert.Equal(double.IsNegative(values.Min()), double.IsNegative(low));
        Assert.Equal(double.IsNegative(values.Max()), double.IsNegative(high));
        var (fromRows, _) = PlotValues.Range(values, [2, 0]);
        Assert.False(double.IsNegative(fromRows));
    }
}
