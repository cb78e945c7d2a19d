using CellCheck.Core.Statistics;
using FsCheck.Xunit;

namespace CellCheck.Core.Tests.Properties;

/// <summary>
/// The statistics whose methods are defined on centred and standardised values do not change when every value is
/// shifted and multiplied by the same positive number (Shapiro-Wilk W, Anderson-Darling A², D'Agostino-Pearson K²,
/// Levene and Brown-Forsythe F, Bartlett's K², Fligner-Killeen's statistic), down to the method's own rounding.
/// Inputs from <see cref="Generators"/>: the transform itself is exact.
/// </summary>
public sealed class LocationScaleInvarianceTests
{
    /// <summary>Tolerance, relative with an absolute floor of the same size (for statistics near 0, which are
    /// differences of terms near 1): double rounding in sums of up to 90 centred values stays far below 1e-9, while
    /// a sum taken about zero instead of about a data value errs by about 1e-7 at a shift of 1e9.</summary>
    private const double Tolerance = 1e-9;

    [Property(MaxTest = 300, Replay = "(20260301,1013904223)", Arbitrary = [typeof(Generators)])]
    public void Shapiro_wilk_anderson_darling_and_k_squared_do_not_change_under_shift_and_positive_scale(Transformed t)
    {
        var x = t.Groups.SelectMany(g => g).ToArray();
        var y = t.Moved.SelectMany(g => g).ToArray();
        Same(ShapiroWilk.Test(x), ShapiroWilk.Test(y), "ShapiroWilk", t);
        Same(AndersonDarling.Test(x), AndersonDarling.Test(y), "AndersonDarling", t);
        Same(DagostinoPearson.Test(x), DagostinoPearson.Test(y), "DagostinoPearson", t);
    }

    [Property(MaxTest = 300, Replay = "(20260302,1013904223)", Arbitrary = [typeof(Generators)])]
    public void Levene_brown_forsythe_bartlett_and_fligner_killeen_do_not_change_under_shift_and_positive_scale(Transformed t)
    {
        var x = GroupedValues.FromGroups(t.Groups);
        var y = GroupedValues.FromGroups(t.Moved);
        Same(Levene.Test(x), Levene.Test(y), "Levene", t);
        Same(BrownForsythe.Test(x), BrownForsythe.Test(y), "BrownForsythe", t);
        Same(Bartlett.Test(x), Bartlett.Test(y), "Bartlett", t);
        Same(FlignerKilleen.Test(x), FlignerKilleen.Test(y), "FlignerKilleen", t);
    }

    private static void Same(TestOutcome a, TestOutcome b, string test, Transformed t)
    {
        Assert.True(a.Reason == b.Reason, $"{test}: reason {a.Reason} became {b.Reason} for {t}");
        if (a.IsTestable)
        {
            Assert.True(Close(a.Statistic, b.Statistic), $"{test}: statistic {a.Statistic:R} became {b.Statistic:R} for {t}");
            Assert.True(Close(a.P, b.P), $"{test}: p {a.P:R} became {b.P:R} for {t}");
        }
    }

    private static bool Close(double a, double b) => a.Equals(b) || Math.Abs(a - b) <= Tolerance * Math.Max(1, Math.Max(Math.Abs(a), Math.Abs(b)));
}
