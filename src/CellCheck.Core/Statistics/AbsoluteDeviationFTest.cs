namespace CellCheck.Core.Statistics;

/// <summary>
/// The shared computation of the Levene and Brown-Forsythe tests: a one-way ANOVA F on the absolute deviations of
/// each value from its group centre. Only groups with at least two values take part.
/// </summary>
internal static class AbsoluteDeviationFTest
{
    /// <summary>Allowance for rounding in one deviation, in units of ε·(|y| + |centre|).</summary>
    private const double RoundingAllowance = 8.0;

    /// <summary>Unit round-off of double precision, 2⁻⁵³.</summary>
    private const double UnitRoundoff = 1.1102230246251565e-16;

    public static TestOutcome Test(GroupedValues groups, SpreadCentre centre)
    {
        ArgumentNullException.ThrowIfNull(groups);
        var part = GroupFilter.AtLeast(groups, 2);
        if (GroupFilter.DeviationTestObstacle(part) is { } obstacle)
        {
            return TestOutcome.NotTestable(obstacle);
        }

        var deviations = new double[part.Count];
        var scratch = new double[GroupFilter.LargestSize(part)];
        var roundingFloor = 0.0;
        for (var g = 0; g < part.GroupCount; g++)
        {
            var y = part.Group(g);
            var c = centre == SpreadCentre.Mean ? Descriptive.Mean(y) : Descriptive.Median(y, scratch);
            var offset = part.Starts[g];
            for (var i = 0; i < y.Length; i++)
            {
                deviations[offset + i] = Math.Abs(y[i] - c);
                var noise = RoundingAllowance * UnitRoundoff * (Math.Abs(y[i]) + Math.Abs(c));
                roundingFloor += noise * noise;
            }
        }

        var table = OneWayAnova.Compute(new GroupedValues(deviations, part.Starts));
        if (!(table.SsWithin > roundingFloor))
        {
            return TestOutcome.NotTestable(NotTestableReason.DegenerateWithinGroups);
        }

        return new TestOutcome(table.F, table.P, table.DfBetween, table.DfWithin);
    }
}
