using CellCheck.Core.Remedies;

namespace CellCheck.Core.Tests.Remedies;

/// <summary>The rounding rule of the recommendation (our own rule, after Box &amp; Cox 1964 §4: a convenient power
/// inside the interval).</summary>
public sealed class PowerLadderTests
{
    private static PowerFit Fit(double lambda, double? lower, double? upper) =>
        new(PowerFamily.BoxCox, "m", 10, 8, lambda, 0, lower, upper, -5, 5, 0);

    [Theory]
    [InlineData(-0.750162520648086, -1.13803, -0.35609, "reciprocal")] // the poisons interval (Box & Cox 1964)
    [InlineData(0.1, -0.3, 0.45, "log")]
    [InlineData(0.4, 0.1, 0.95, "sqrt")]
    [InlineData(0.8, 0.3, 1.2, "none")]
    [InlineData(-0.6, -0.9, -0.4, "reciprocal-sqrt")]
    [InlineData(-1.62, -1.9, -1.3, "power:-1.62")]
    [InlineData(2.3456, 1.8, 2.9, "power:2.35")]
    public void The_nearest_interpretable_power_inside_the_interval_is_recommended(double lambda, double lower, double upper, string name) =>
        Assert.Equal(name, PowerLadder.Recommend(Fit(lambda, lower, upper)).Name);

    [Fact]
    public void An_interval_open_above_that_reaches_one_means_no_transformation()
    {
        Assert.True(PowerLadder.Recommend(Fit(4.9, 0.5, null)).IsIdentity);
        Assert.Equal("power:5", PowerLadder.Recommend(Fit(5, 2, null)).Name);
    }

    [Fact]
    public void Formulas_name_the_shift()
    {
        Assert.Equal("log(count + 1)", new TransformChoice(PowerFamily.BoxCox, 0, 1).Formula("count"));
        Assert.Equal("1/time", new TransformChoice(PowerFamily.BoxCox, -1).Formula("time"));
        Assert.Equal("(y - 2.5)^0.33", new TransformChoice(PowerFamily.BoxCox, 0.33, -2.5).Formula("y"));
        Assert.Equal("yeo-johnson(y, 0.5)", new TransformChoice(PowerFamily.YeoJohnson, 0.5).Formula("y"));
    }
}
