using CellCheck.Core.Statistics;
using FsCheck.Xunit;

namespace CellCheck.Core.Tests.Properties;

/// <summary>The order of the rows within a cell carries no information for any cell statistic or spread test.</summary>
public sealed class WithinCellPermutationTests
{
    /// <summary>Tolerance, relative with an absolute floor of the same size: only the order of summation changes,
    /// which moves a double sum of at most 90 values by a few units in the last place; statistics near 0 (Bartlett's
    /// K² of near-equal variances) are differences of terms near 1 and take the floor.</summary>
    private const double Tolerance = 1e-11;

    [Property(MaxTest = 300, Replay = "(20260303,1013904223)", Arbitrary = [typeof(Generators)])]
    public void Permuting_rows_within_cells_changes_no_cell_statistic_or_spread_test(Permuted p)
    {
        for (var g = 0; g < p.Groups.Length; g++)
        {
            var a = p.Groups[g];
            var b = p.Shuffled[g];
            Close(Descriptive.Mean(a), Descriptive.Mean(b), "mean", p);
            Close(Descriptive.Variance(a), Descriptive.Variance(b), "variance", p);
            Close(Descriptive.Median(a), Descriptive.Median(b), "median", p);
            Same(ShapiroWilk.Test(a), ShapiroWilk.Test(b), "shapiro-wilk", p);
            Same(AndersonDarling.Test(a), AndersonDarling.Test(b), "anderson-darling", p);
        }

        var x = GroupedValues.FromGroups(p.Groups);
        var y = GroupedValues.FromGroups(p.Shuffled);
        Same(Levene.Test(x), Levene.Test(y), "levene", p);
        Same(BrownForsythe.Test(x), BrownForsythe.Test(y), "brown-forsythe", p);
        Same(BrownForsytheZerosRemoved.Test(x), BrownForsytheZerosRemoved.Test(y), "brown-forsythe-zeros-removed", p);
        Same(Bartlett.Test(x), Bartlett.Test(y), "bartlett", p);
        Same(FlignerKilleen.Test(x), FlignerKilleen.Test(y), "fligner-killeen", p);
    }

    private static void Same(TestOutcome a, TestOutcome b, string what, Permuted p)
    {
        Assert.True(a.Reason == b.Reason, $"{what}: reason {a.Reason} became {b.Reason} for {p}");
        if (a.IsTestable)
        {
            Close(a.Statistic, b.Statistic, what + " statistic", p);
            Close(a.P, b.P, what + " p", p);
        }
    }

    private static void Close(double a, double b, string what, Permuted p) => Assert.True(
        a.Equals(b) || Math.Abs(a - b) <= Tolerance * Math.Max(1, Math.Max(Math.Abs(a), Math.Abs(b))), $"{what} {a:R} became {b:R} for {p}");
}
