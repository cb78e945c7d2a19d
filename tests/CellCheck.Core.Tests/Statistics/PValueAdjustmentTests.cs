using CellCheck.Core.Statistics;
using CellCheck.Core.Tests.Support;

namespace CellCheck.Core.Tests.Statistics;

public sealed class PValueAdjustmentTests
{
    // three ties at 0.04 and one missing value (NaN here, NA in R)
    private static readonly double[] Raw = [0.01, 0.04, 0.04, 0.2, double.NaN, 0.003, 0.5, 0.04, 0.9, 0.0001, 0.6];

    // Adjusted values are a product and a running max/min of raw values: equal to R up to one rounding
    private const double Tolerance = 1e-15;

    [Fact]
    public void Holm_matches_R()
    {
        // R 4.2.2 p.adjust(c(0.01, 0.04, 0.04, 0.2, NA, 0.003, 0.5, 0.04, 0.9, 0.0001, 0.6), "holm")
        double[] expected = [0.08, 0.28, 0.28, 0.8, double.NaN, 0.027, 1, 0.28, 1, 0.001, 1];

        AssertAll(expected, PValueAdjustment.Adjust(Raw, AdjustMethod.Holm));
    }

    [Fact]
    public void Benjamini_Hochberg_matches_R()
    {
        // R 4.2.2 p.adjust(c(0.01, 0.04, 0.04, 0.2, NA, 0.003, 0.5, 0.04, 0.9, 0.0001, 0.6), "BH")
        double[] expected =
        [
            0.033333333333333333, 0.066666666666666666, 0.066666666666666666, 0.285714285714285754, double.NaN,
            0.014999999999999999, 0.625, 0.066666666666666666, 0.900000000000000022, 0.001, 0.666666666666666630,
        ];

        AssertAll(expected, PValueAdjustment.Adjust(Raw, AdjustMethod.BenjaminiHochberg));
    }

    [Fact]
    public void None_returns_a_copy_of_the_input()
    {
        var adjusted = PValueAdjustment.Adjust(Raw, AdjustMethod.None);

        Assert.Equal(Raw, adjusted);
        Assert.NotSame(Raw, adjusted);
    }

    [Fact]
    public void All_missing_stays_missing()
    {
        var adjusted = PValueAdjustment.Adjust([double.NaN, double.NaN], AdjustMethod.Holm);

        Assert.All(adjusted, p => Assert.True(double.IsNaN(p)));
    }

    [Fact]
    public void A_value_outside_the_unit_interval_is_rejected()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => PValueAdjustment.Adjust([0.5, 1.5], AdjustMethod.Holm));
    }

    private static void AssertAll(double[] expected, double[] actual)
    {
        Assert.Equal(expected.Length, actual.Length);
        for (var i = 0; i < expected.Length; i++)
        {
            if (double.IsNaN(expected[i]))
            {
                Assert.True(double.IsNaN(actual[i]), $"entry {i} should stay NaN");
            }
            else
            {
                Accuracy.AssertRelative(expected[i], actual[i], Tolerance, $"entry {i}");
            }
        }
    }
}
