using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Statistics;

public sealed class DescriptiveTests
{
    [Fact]
    public void Median_of_an_even_sample_is_the_mean_of_the_middle_pair()
    {
        // common practice, no source
        Assert.Equal(2.5, Descriptive.Median([4.0, 1.0, 3.0, 2.0]));
    }

    [Fact]
    public void Variance_survives_thirteen_constant_leading_digits()
    {
        // 1e12 + {0.25, 0.5, 0.75}: these offsets are exact in binary at this magnitude; variance 0.0625 (exact arithmetic)
        double[] x = [1e12 + 0.25, 1e12 + 0.5, 1e12 + 0.75];
        Assert.Equal(0.0625, Descriptive.Variance(x), 1e-15);
    }
}
