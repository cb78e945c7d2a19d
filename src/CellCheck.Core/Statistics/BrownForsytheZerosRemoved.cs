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
    public static TestOutcome Test(GroupedValues groups) => SpreadKernel.Run(groups, SpreadTests.BrownForsytheZerosRemoved).BrownForsytheZerosRemoved!;

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
            at += KeptDeviations(y, Descriptive.Median(y, scratch), deviations.AsSpan(at));
            starts[g + 1] = at;
        }

        var table = OneWayAnova.Compute(new GroupedValues(deviations[..at], starts));
        return table.SsWithin > 0 && double.IsFinite(table.F) ? table.F : double.NaN;
    }

    /// <summary>Writes the absolute deviations of a group from its median, less one zero when the size is odd, into
    /// <paramref name="deviations"/>; returns how many.</summary>
    internal static int KeptDeviations(ReadOnlySpan<double> y, double median, Span<double> deviations)
    {
        var at = 0;
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

        return at;
    }
}
