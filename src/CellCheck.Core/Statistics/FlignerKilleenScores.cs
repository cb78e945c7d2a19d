namespace CellCheck.Core.Statistics;

/// <summary>
/// The Fligner-Killeen statistic from the group medians: the absolute deviations are put in ascending order tagged
/// with their groups (<see cref="DeviationOrder"/>), ranked over all values with ties as <see cref="FlignerKilleen"/>
/// defines them, each run of ties scored once, and each score added straight to its groups' sums (Neumaier's
/// compensation), so no score is stored. X² = Σ n_g (ā_g − ā)² / (S / (N − 1)) with S = Σ a² − (Σ a)² / N taken from the
/// runs. Runs are scored side by side in ranges of the order that start at run starts found by one scan, each range with
/// its own sums, which are added in range order: the ranges depend on the data alone, so the result does not depend on
/// the threads.
/// </summary>
internal static class FlignerKilleenScores
{
    /// <summary>Fewest ordered positions a range of scoring holds.</summary>
    private const int ScoreChunk = 1 << 18;

    /// <summary>Most ranges of scoring (each holds two sums per group).</summary>
    private const int MostRanges = 8;

    /// <summary>The test on <paramref name="part"/> (at least two groups, each of at least two values).</summary>
    public static TestOutcome Test(GroupedValues part, double[] medians, double magnitude)
    {
        var n = part.Count;
        var order = DeviationOrder.Sort(part, medians, everyKeyKept: n < RadixSort.Threshold);
        var tolerance = FlignerKilleen.TieUlps * (Math.BitIncrement(magnitude) - magnitude);
        var bounds = Bounds(order, tolerance, Math.Max(ScoreChunk, n / Math.Clamp((1 << 22) / part.GroupCount, 1, MostRanges)));
        var ranges = new ScoreSums[bounds.Count - 1];
        if (ranges.Length == 1)
        {
            ranges[0] = ScoreRange(order, tolerance, part.GroupCount, 0, n);
        }
        else
        {
            Parallel.For(0, ranges.Length, r => ranges[r] = ScoreRange(order, tolerance, part.GroupCount, bounds[r], bounds[r + 1]));
        }

        var (between, total, runs) = ScoreSums.Table(ranges, part);
        if (runs < 2 || !(total > 0))
        {
            return TestOutcome.NotTestable(NotTestableReason.DegenerateWithinGroups);
        }

        var statistic = between / (total / (n - 1));
        var df = part.GroupCount - 1;
        return new TestOutcome(statistic, UpperTail.ChiSquare(statistic, df), df);
    }

    /// <summary>Run starts at least <paramref name="chunk"/> positions apart, from 0 to the end.</summary>
    private static List<int> Bounds(DeviationOrder order, double tolerance, int chunk)
    {
        var n = order.Count;
        var bounds = new List<int> { 0 };
        if (n > chunk)
        {
            var bucket = 0;
            for (var start = 0; start < n;)
            {
                var end = RunEnd(order, start, ref bucket, tolerance);
                if (end < n && end - bounds[^1] >= chunk)
                {
                    bounds.Add(end);
                }

                start = end;
            }
        }

        bounds.Add(n);
        return bounds;
    }

    /// <summary>Scores the runs from <paramref name="first"/> (a run start) to <paramref name="last"/> (a run end).</summary>
    private static ScoreSums ScoreRange(DeviationOrder order, double tolerance, int groups, int first, int last)
    {
        var n = order.Count;
        var sums = new ScoreSums(groups);
        var lead = order.BucketOf(first);
        var trail = lead;
        for (var start = first; start < last;)
        {
            var end = RunEnd(order, start, ref lead, tolerance);

            // positions start..end-1 hold ranks start+1..end; their mean is (start + 1 + end) / 2
            var rank = 0.5 * (start + 1 + end);
            var score = StandardNormal.Quantile((1.0 + (rank / (n + 1))) / 2.0);
            for (var j = start; j < end; j++)
            {
                order.At(j, ref trail, out var g);
                sums.Add(g, score);
            }

            sums.AddRun(end - start, score);
            start = end;
        }

        return sums;
    }

    /// <summary>The end of the run of ties that starts at <paramref name="start"/>.</summary>
    private static int RunEnd(DeviationOrder order, int start, ref int bucket, double tolerance)
    {
        var first = order.At(start, ref bucket, out _);
        var end = start + 1;
        while (end < order.Count && order.At(end, ref bucket, out _) - first <= tolerance)
        {
            end++;
        }

        return end;
    }
}
