using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Support;

/// <summary>
/// The five spread tests each computed alone from its own copies of the values (deviations for all values, medians by
/// selection on a scratch copy, ranks by the general tie-averaging ranker), the way each was written before they were
/// computed together: the reference the shared computation must equal bit for bit.
/// </summary>
internal static class SeparateSpreadTests
{
    public static TestOutcome AbsoluteDeviationF(GroupedValues groups, bool median)
    {
        var part = GroupFilter.AtLeast(SampleGuard.Scaled(groups), 2);
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
            var origin = y[0];
            var d = new double[y.Length];
            for (var i = 0; i < y.Length; i++)
            {
                d[i] = y[i] - origin;
            }

            var c = median ? Descriptive.Median(d, scratch) : Descriptive.Mean(d);
            for (var i = 0; i < y.Length; i++)
            {
                deviations[part.Starts[g] + i] = Math.Abs(d[i] - c);
                var noise = 8.0 * 1.1102230246251565e-16 * (Math.Abs(y[i]) + Math.Abs(origin + c));
                roundingFloor += noise * noise;
            }
        }

        var table = SeparateOneWayAnova.Compute(new GroupedValues(deviations, part.Starts));
        return table.SsWithin > roundingFloor
            ? new TestOutcome(table.F, table.P, table.DfBetween, table.DfWithin)
            : TestOutcome.NotTestable(NotTestableReason.DegenerateWithinGroups);
    }

    public static TestOutcome ZerosRemoved(GroupedValues groups)
    {
        var part = GroupFilter.AtLeast(SampleGuard.Scaled(groups), 2);
        if (GroupFilter.DeviationTestObstacle(part) is { } obstacle)
        {
            return TestOutcome.NotTestable(obstacle);
        }

        var kept = new List<double[]>();
        foreach (var g in Enumerable.Range(0, part.GroupCount))
        {
            var y = part.Group(g).ToArray();
            var median = Descriptive.Median(y);
            var skipped = y.Length % 2 == 0;
            var deviations = new List<double>();
            foreach (var v in y)
            {
                if (!skipped && v == median)
                {
                    skipped = true;
                    continue;
                }

                deviations.Add(Math.Abs(v - median));
            }

            kept.Add([.. deviations]);
        }

        var grouped = GroupedValues.FromGroups(kept);
        var table = SeparateOneWayAnova.Compute(grouped);
        if (!(table.SsWithin > 0 && double.IsFinite(table.F)))
        {
            return TestOutcome.NotTestable(NotTestableReason.DegenerateWithinGroups);
        }

        var (df1, df2) = (part.GroupCount - 1, grouped.Count - part.GroupCount);
        return new TestOutcome(table.F, UpperTail.F(table.F, df1, df2), df1, df2);
    }

    public static TestOutcome Bartlett(GroupedValues groups)
    {
        groups = SampleGuard.Scaled(groups);
        if (GroupFilter.CountAtLeast(groups, 2) < 2)
        {
            return TestOutcome.NotTestable(NotTestableReason.TooFewGroups);
        }

        var (k, nu, pooledSs, reciprocalSum) = (0, 0, 0.0, 0.0);
        var variances = new double[groups.GroupCount];
        for (var g = 0; g < groups.GroupCount; g++)
        {
            var y = groups.Group(g);
            if (y.Length < 2)
            {
                continue;
            }

            var ss = Descriptive.SumOfSquares(y);
            if (!(ss > 0))
            {
                return TestOutcome.NotTestable(NotTestableReason.ZeroVarianceGroup);
            }

            variances[g] = ss / (y.Length - 1);
            pooledSs += ss;
            reciprocalSum += 1.0 / (y.Length - 1);
            nu += y.Length - 1;
            k++;
        }

        var numerator = 0.0;
        for (var g = 0; g < groups.GroupCount; g++)
        {
            if (groups.Size(g) >= 2)
            {
                numerator += (groups.Size(g) - 1) * Math.Log(pooledSs / nu / variances[g]);
            }
        }

        var statistic = Math.Max(0.0, numerator / (1.0 + ((reciprocalSum - (1.0 / nu)) / (3.0 * (k - 1)))));
        return new TestOutcome(statistic, UpperTail.ChiSquare(statistic, k - 1), k - 1);
    }

    public static TestOutcome FlignerKilleen(GroupedValues groups)
    {
        var part = GroupFilter.AtLeast(SampleGuard.Scaled(groups), 2);
        if (part.GroupCount < 2)
        {
            return TestOutcome.NotTestable(NotTestableReason.TooFewGroups);
        }

        var n = part.Count;
        var scores = new double[n];
        var magnitude = part.Values.Max(Math.Abs);
        for (var g = 0; g < part.GroupCount; g++)
        {
            var y = part.Group(g);
            var median = Descriptive.Median(y);
            for (var i = 0; i < y.Length; i++)
            {
                scores[part.Starts[g] + i] = Math.Abs(y[i] - median);
            }
        }

        TieAveragedRanks.Compute(scores, scores, Core.Statistics.FlignerKilleen.TieUlps * (Math.BitIncrement(magnitude) - magnitude),
            rank => StandardNormal.Quantile((1.0 + (rank / (n + 1))) / 2.0));
        var table = SeparateOneWayAnova.Compute(new GroupedValues(scores, part.Starts));
        var total = table.SsBetween + table.SsWithin;
        if (!(total > 0))
        {
            return TestOutcome.NotTestable(NotTestableReason.DegenerateWithinGroups);
        }

        var statistic = table.SsBetween / (total / (n - 1));
        return new TestOutcome(statistic, UpperTail.ChiSquare(statistic, part.GroupCount - 1), part.GroupCount - 1);
    }
}
