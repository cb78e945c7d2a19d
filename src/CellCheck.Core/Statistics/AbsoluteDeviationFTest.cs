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
        var part = GroupFilter.AtLeast(SampleGuard.Scaled(groups), 2);
        if (GroupFilter.DeviationTestObstacle(part) is { } obstacle)
        {
            return TestOutcome.NotTestable(obstacle);
        }

        var deviations = new double[part.Count];
        var scratch = new double[GroupFilter.LargestSize(part)];
        var shifted = new double[GroupFilter.LargestSize(part)];
        var roundingFloor = 0.0;
        for (var g = 0; g < part.GroupCount; g++)
        {
            // Centre about the group's first value before taking the mean or median: y − y₀ is exact for values
            // with many constant leading digits, so the centre is not rounded at the data's magnitude.
            var y = part.Group(g);
            var origin = y[0];
            var d = shifted.AsSpan(0, y.Length);
            for (var i = 0; i < y.Length; i++)
            {
                d[i] = y[i] - origin;
            }

            var c = centre == SpreadCentre.Mean ? Descriptive.Mean(d) : Descriptive.Median(d, scratch);
            var offset = part.Starts[g];
            for (var i = 0; i < y.Length; i++)
            {
                deviations[offset + i] = Math.Abs(d[i] - c);
                var noise = RoundingAllowance * UnitRoundoff * (Math.Abs(y[i]) + Math.Abs(origin + c));
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
