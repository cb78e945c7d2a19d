using CellCheck.Core.Plots;

namespace CellCheck.Core.Tests.Plots;

public sealed class AxisScaleTests
{
    [Theory]
    [InlineData(-1.27, 1.27)]
    [InlineData(5.8, 6.8)]
    [InlineData(70.9, 74.5)]
    [InlineData(0.0012, 0.0031)]
    [InlineData(-3000, 12000)]
    public void A_linear_axis_pads_the_data_and_has_three_to_eight_round_ticks_inside(double lo, double hi)
    {
        var axis = AxisScale.Linear("x", lo, hi);
        Assert.True(axis.Min < lo && axis.Max > hi);
        Assert.InRange(axis.Ticks.Count, 3, 8);
        Assert.All(axis.Ticks, t => Assert.InRange(t.Value, axis.Min, axis.Max));
        var step = axis.Ticks[1].Value - axis.Ticks[0].Value;
        var mantissa = step / Math.Pow(10, Math.Floor(Math.Log10(step)));
        Assert.Contains(Math.Round(mantissa, 6), new[] { 1.0, 2.0, 2.5, 5.0 });
    }

    [Fact]
    public void Tick_labels_use_a_true_minus_and_as_many_decimals_as_the_step()
    {
        Assert.Equal(["\u22120.5", "0.0", "0.5"], AxisScale.Exact("x", -0.55, 0.55).Ticks.Select(t => t.Label));
        Assert.Equal(["\u22121", "0", "1"], AxisScale.Exact("x", -1.1, 1.1).Ticks.Select(t => t.Label));
    }

    [Fact]
    public void A_zero_range_is_widened()
    {
        var axis = AxisScale.Linear("x", 3, 3);
        Assert.True(axis.Max > axis.Min);
        Assert.NotEmpty(axis.Ticks);
    }

    [Fact]
    public void A_log_axis_places_ticks_at_log10_of_round_values()
    {
        var axis = AxisScale.Log10("sd", 0.02, 30);
        Assert.All(axis.Ticks, t => Assert.InRange(t.Value, axis.Min, axis.Max));
        Assert.Contains(axis.Ticks, t => t.Label == "1" && Math.Abs(t.Value) < 1e-12);
        Assert.Contains(axis.Ticks, t => t.Label == "10" && Math.Abs(t.Value - 1) < 1e-12);
        var narrow = AxisScale.Log10("mean", 5.8, 6.8);
        Assert.True(narrow.Ticks.Count >= 3);
    }
}
