using CellCheck.Core.Statistics;
using FsCheck.Xunit;

namespace CellCheck.Core.Tests.Properties;

/// <summary>For any finite input every test either returns a p-value in [0, 1] with a statistic that is a number
/// (K² is +∞ with p = 0 beyond the fitted kurtosis range, as documented), or says why it cannot (a not-testable
/// reason): never NaN or a probability outside [0, 1] as a result.</summary>
public sealed class PValueRangeTests
{
    [Property(MaxTest = 500, Replay = "(20260304,1013904223)", Arbitrary = [typeof(Generators)])]
    public void Every_test_gives_a_p_value_in_the_unit_interval_or_a_reason(double[][] groups)
    {
        var pooled = groups.SelectMany(g => g).ToArray();
        Valid(ShapiroWilk.Test(pooled), "shapiro-wilk", groups);
        Valid(AndersonDarling.Test(pooled), "anderson-darling", groups);
        Valid(DagostinoPearson.Test(pooled), "dagostino-pearson", groups);
        var grouped = GroupedValues.FromGroups(groups);
        Valid(Levene.Test(grouped), "levene", groups);
        Valid(BrownForsythe.Test(grouped), "brown-forsythe", groups);
        Valid(BrownForsytheZerosRemoved.Test(grouped), "brown-forsythe-zeros-removed", groups);
        Valid(Bartlett.Test(grouped), "bartlett", groups);
        Valid(FlignerKilleen.Test(grouped), "fligner-killeen", groups);
    }

    private static void Valid(TestOutcome o, string test, double[][] groups)
    {
        var shown = "[" + string.Join("; ", groups.Select(g => string.Join(", ", g.Select(x => x.ToString("R", System.Globalization.CultureInfo.InvariantCulture))))) + "]";
        if (o.Reason is not null && double.IsNaN(o.P))
        {
            return;
        }

        Assert.True(o.P >= 0 && o.P <= 1, $"{test}: p = {o.P:R} for {shown}");
        Assert.False(double.IsNaN(o.Statistic), $"{test}: statistic = NaN for {shown}");
    }
}
