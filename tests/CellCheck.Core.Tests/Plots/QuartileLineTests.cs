using CellCheck.Core.Plots;

namespace CellCheck.Core.Tests.Plots;

public sealed class QuartileLineTests
{
    [Fact]
    public void The_reference_line_passes_through_the_sample_quartiles_at_the_normal_quartiles()
    {
        // R 4.2: quantile(c(1, 2, 3, 4, 10), c(0.25, 0.75)) gives 2 and 4 (type 7, R's default); qnorm(0.75) = 0.6744897501960817.
        double[] sorted = [1, 2, 3, 4, 10];
        var line = QuartileLine.Through(sorted);
        Assert.Equal(0.6744897501960817, QuartileLine.NormalQuartile, 1e-15);
        Assert.Equal(2.0, line.At(-QuartileLine.NormalQuartile), 1e-12);
        Assert.Equal(4.0, line.At(QuartileLine.NormalQuartile), 1e-12);
        Assert.Equal(3.0, line.Intercept, 1e-12);
    }

    [Theory]
    [InlineData(0.25, 2.75)]
    [InlineData(0.5, 4.5)]
    [InlineData(0.75, 6.25)]
    public void Quartiles_interpolate_between_order_statistics_as_type_7(double p, double expected)
    {
        // R: quantile(1:8, c(0.25, 0.5, 0.75)) = 2.75, 4.5, 6.25
        double[] sorted = [1, 2, 3, 4, 5, 6, 7, 8];
        Assert.Equal(expected, QuartileLine.Quantile(sorted, p), 1e-12);
    }

    [Fact]
    public void Equal_quartiles_give_a_flat_line_through_them()
    {
        var line = QuartileLine.Through([5.0, 5.0, 5.0, 5.0, 9.0]);
        Assert.Equal(0.0, line.Slope);
        Assert.Equal(5.0, line.Intercept);
    }
}
