namespace CellCheck.Core.Statistics;

/// <summary>
/// The Brown-Forsythe (median-centred Levene) test with structural zeros removed, after Hines &amp; O'Hara Hines
/// (2000, "Increased power with modified forms of the Levene (Med) test for heterogeneity of variance",
/// Biometrics 56, 451-454). In a group of odd size the median is one of the values, so one absolute deviation is
/// zero by construction whatever the spread; it carries no information and makes the test conservative at small
/// odd n. One such zero is removed from each odd-sized group before the one-way ANOVA F on the deviations, which is
/// referred to F(k − 1, M − k) with M the number of deviations kept (the same F approximation as Levene's test).
/// </summary>
/// <remarks>
/// Only groups with at least two values take part. Not testable with fewer than two such groups
/// (<see cref="NotTestableReason.TooFewGroups"/>), when every group has two values
/// (<see cref="NotTestableReason.AllGroupsOfTwo"/>), or when the kept deviations do not vary within groups
/// (<see cref="NotTestableReason.DegenerateWithinGroups"/>).
/// </remarks>
public static class BrownForsytheZerosRemoved
{
    public static TestOutcome Test(GroupedValues groups)
    {
        ArgumentNullException.ThrowIfNull(groups);
        var part = GroupFilter.AtLeast(SampleGuard.Scaled(groups), 2);
        if (GroupFilter.DeviationTestObstacle(part) is { } obstacle)
        {
            return TestOutcome.NotTestable(obstacle);
        }

        var deviations = new double[part.Count];
        var starts = new int[part.GroupCount + 1];
        var scratch = new double[GroupFilter.LargestSize(part)];
        var statistic = Statistic(part, deviations, starts, scratch);
        if (double.IsNaN(statistic))
        {
            return TestOutcome.NotTestable(NotTestableReason.DegenerateWithinGroups);
        }

        var df1 = part.GroupCount - 1;
        var df2 = starts[^1] - part.GroupCount;
        return new TestOutcome(statistic, UpperTail.F(statistic, df1, df2), df1, df2);
    }

    /// <summary>
    /// The F statistic alone, into caller-owned buffers (deviations: N, starts: k + 1, scratch: largest group);
    /// NaN when the kept deviations do not vary within groups. Every group must have at least two values.
    /// </summary>
    internal static double Statistic(GroupedValues part, double[] deviations, int[] starts, double[] scratch)
    {
        var at = 0;
        starts[0] = 0;
        for (var g = 0; g < part.GroupCount; g++)
        {
            var y = part.Group(g);
            var median = Descriptive.Median(y, scratch);
            var skipped = y.Length % 2 == 0;
            foreach (var v in y)
            {
                if (!skipped && v == median)
                {
                    skipped = true;
                    continue;
                }

                deviations[at++] = Math.Abs(v - median);
            }

            starts[g + 1] = at;
        }

        var table = OneWayAnova.Compute(new GroupedValues(deviations[..at], starts));
        return table.SsWithin > 0 && double.IsFinite(table.F) ? table.F : double.NaN;
    }
}
