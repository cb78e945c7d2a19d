using CellCheck.Core.Remedies;
using CellCheck.Core.Statistics;
using CellCheck.Core.Tests.Statistics;
using CellCheck.Core.Tests.Support;

namespace CellCheck.Core.Tests.Remedies;

/// <summary>Spread versus level on the poisons cells against R 4.2.2 (Fixtures/remedy-check-values.R): a
/// closed-form least-squares slope, 1e-12 relative.</summary>
public sealed class SpreadLevelTests
{
    private static (int[] N, double[] Mean, double[] Sd) Cells(GroupedValues g) =>
        (Enumerable.Range(0, g.GroupCount).Select(g.Size).ToArray(),
         Enumerable.Range(0, g.GroupCount).Select(c => g.Group(c).ToArray().Average()).ToArray(),
         Enumerable.Range(0, g.GroupCount).Select(c => Sd(g.Group(c).ToArray())).ToArray());

    private static double Sd(double[] v)
    {
        var m = v.Average();
        return Math.Sqrt(v.Sum(x => (x - m) * (x - m)) / (v.Length - 1));
    }

    [Fact]
    public void The_poisons_spread_grows_with_the_square_of_the_mean_and_suggests_the_reciprocal()
    {
        var (n, mean, sd) = Cells(CsvGroups.Load("poisons.csv", "time", ["poison", "treat"]));
        var fit = SpreadLevel.Fit(n, mean, sd);
        // R: coef(lm(log(sd) ~ log(mean)))[2] over the 12 cells = 1.9770404641263266
        Close.Relative(1.9770404641263266, fit.Slope!.Value, 1e-12);
        Close.Relative(1 - 1.9770404641263266, fit.Power!.Value, 1e-12);
        Assert.Equal(12, fit.Cells);
        // R: summary(lm(...))$coefficients[2, 2] = 0.26327604087589446; 1 - confint(lm(...))[2, ] = -1.5636560395990333,
        // -0.39042488865361991 (t quantile with 10 df from MathNet against R's qt: 1e-10 relative)
        Close.Relative(0.26327604087589446, fit.SlopeStandardError!.Value, 1e-10);
        Close.Relative(-1.5636560395990333, fit.PowerLower!.Value, 1e-10);
        Close.Relative(-0.39042488865361991, fit.PowerUpper!.Value, 1e-10);
    }

    [Fact]
    public void After_the_reciprocal_the_slope_on_the_original_means_is_near_zero()
    {
        var (n, mean, _) = Cells(CsvGroups.Load("poisons.csv", "time", ["poison", "treat"]));
        var (_, _, sdAfter) = Cells(CsvGroups.Load("poisons.csv", "time", ["poison", "treat"], t => 1 / t));
        // R: coef(lm(log(sd of 1/time) ~ log(mean of time)))[2] = -0.0026885467419746414; the slope is a small
        // difference of sums, so 1e-9 relative
        Close.Relative(-0.0026885467419746414, SpreadLevel.Fit(n, mean, sdAfter).Slope!.Value, 1e-9);
    }

    [Fact]
    public void Non_positive_means_and_too_few_cells_give_reasons()
    {
        Assert.Equal(RemedyReason.NonPositiveValues, SpreadLevel.Fit([3, 3, 3], [1, -2, 3], [1, 1, 1]).Reason);
        Assert.Equal(RemedyReason.TooFewCells, SpreadLevel.Fit([3, 3, 1], [1, 2, 3], [1, 1, double.NaN]).Reason);
        Assert.Equal(RemedyReason.NoLevelSpread, SpreadLevel.Fit([3, 3, 3], [2, 2, 2], [1, 2, 3]).Reason);
        Assert.Null(SpreadLevel.Fit([3, 3, 3], [2, 2, 2], [1, 2, 3]).Power);
    }
}
