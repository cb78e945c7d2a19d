using System.Runtime.InteropServices;

namespace CellCheck.Core.Statistics;

/// <summary>
/// The Fligner-Killeen statistic from the group medians: the absolute deviations are made straight into the sort keys
/// (groups side by side), ranked over all values with ties as <see cref="FlignerKilleen"/> defines them, and each run of
/// ties scored once; the normal scores are written into the sort's free key buffer, so the test holds the two key
/// buffers and the two order buffers of the sort and nothing more. Runs are scored side by side in ranges of the
/// sorted keys that start at run starts found by one scan, so the runs, and each score, are those of
/// <see cref="TieAveragedRanks"/>.
/// </summary>
internal static class FlignerKilleenScores
{
    /// <summary>Sorted positions per range of scoring.</summary>
    private const int ScoreChunk = 1 << 18;

    /// <summary>The test on <paramref name="part"/> (at least two groups, each of at least two values).</summary>
    public static TestOutcome Test(GroupedValues part, double[] medians, double magnitude)
    {
        var n = part.Count;
        var keys = GC.AllocateUninitializedArray<ulong>(n); // written in full below
        GroupChunks.ForEach(part.Starts, (first, end) =>
        {
            for (var g = first; g < end; g++)
            {
                var offset = part.Starts[g];
                var y = part.Group(g);
                for (var i = 0; i < y.Length; i++)
                {
                    keys[offset + i] = RadixSort.KeyOf(Math.Abs(y[i] - medians[g]));
                }
            }
        });
        var sorted = RadixSort.SortKeys(keys, out var order, out var free);
        // the scores' bits, in the key buffer the sort left free
        var scores = free ?? new ulong[n];
        Score(sorted, order, scores, FlignerKilleen.TieUlps * (Math.BitIncrement(magnitude) - magnitude));
        var table = ScoreTable(part, scores);
        var total = table.SsBetween + table.SsWithin;
        if (!(total > 0))
        {
            return TestOutcome.NotTestable(NotTestableReason.DegenerateWithinGroups);
        }

        var statistic = table.SsBetween / (total / (n - 1));
        var df = part.GroupCount - 1;
        return new TestOutcome(statistic, UpperTail.ChiSquare(statistic, df), df);
    }

    /// <summary>The normal score of each value's mid-rank (see <see cref="FlignerKilleen"/>), as bits, at its place.</summary>
    private static void Score(ulong[] sorted, int[] order, ulong[] scores, double tolerance)
    {
        var n = sorted.Length;
        var bounds = new List<int> { 0 };
        if (n > ScoreChunk)
        {
            for (var start = 0; start < n;)
            {
                var end = RunEnd(sorted, start, tolerance);
                if (end < n && end - bounds[^1] >= ScoreChunk)
                {
                    bounds.Add(end);
                }

                start = end;
            }
        }

        bounds.Add(n);
        if (bounds.Count == 2)
        {
            ScoreRange(sorted, order, scores, tolerance, 0, n);
            return;
        }

        Parallel.For(0, bounds.Count - 1, r => ScoreRange(sorted, order, scores, tolerance, bounds[r], bounds[r + 1]));
    }

    /// <summary>Scores the runs from <paramref name="first"/> (a run start) to <paramref name="last"/> (a run end).</summary>
    private static void ScoreRange(ulong[] sorted, int[] order, ulong[] scores, double tolerance, int first, int last)
    {
        var n = sorted.Length;
        for (var start = first; start < last;)
        {
            var end = RunEnd(sorted, start, tolerance);

            // positions start..end-1 hold ranks start+1..end; their mean is (start + 1 + end) / 2
            var rank = 0.5 * (start + 1 + end);
            var score = BitConverter.DoubleToUInt64Bits(StandardNormal.Quantile((1.0 + (rank / (n + 1))) / 2.0));
            for (var j = start; j < end; j++)
            {
                scores[order[j]] = score;
            }

            start = end;
        }
    }

    /// <summary>The end of the run of ties that starts at <paramref name="start"/>.</summary>
    private static int RunEnd(ulong[] sorted, int start, double tolerance)
    {
        var end = start + 1;
        while (end < sorted.Length && RadixSort.ValueOf(sorted[end]) - RadixSort.ValueOf(sorted[start]) <= tolerance)
        {
            end++;
        }

        return end;
    }

    private static AnovaTable ScoreTable(GroupedValues part, ulong[] scores)
    {
        var parts = new GroupAnovaParts(part.GroupCount);
        GroupChunks.ForEach(part.Starts, (first, end) =>
        {
            for (var g = first; g < end; g++)
            {
                parts.Set(g, MemoryMarshal.Cast<ulong, double>(scores.AsSpan(part.Starts[g], part.Size(g))));
            }
        });
        return parts.Table();
    }
}
