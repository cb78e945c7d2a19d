namespace CellCheck.Core.Order;

/// <summary>The traces behind <see cref="GroupedDurbinWatson"/>'s exact moments: tr(MA), tr((MA)²) and the groups
/// present, for M the residual projector of the group indicators and A the Durbin-Watson difference matrix, in O(n)
/// time from the run sequence of the groups (formulas in <see cref="GroupedDurbinWatson"/>'s remarks).</summary>
internal static class GroupTraces
{
    /// <summary>tr(MA), tr((MA)²) and the number of groups present, for M the residual projector of the group indicators.
    /// One pass in run order gathers b_c and ‖A1_c‖² per group and buckets every step between two groups under the lower
    /// one (so each group's memory is touched, never the run sequence at random); further passes, one per range of lower
    /// groups whose steps fit in <see cref="PartnerRange"/>, list those steps and count them per pair, in group order.</summary>
    public static (double TraceMA, double TraceMA2, int Groups) Of(ReadOnlySpan<int> group, int groups) =>
        Of(group, groups, PartnerRange);

    /// <summary>Most steps between groups listed at once (16 MB): a run sequence of ten million values in ten thousand
    /// cells has about as many steps, which took 40 MB listed all together.</summary>
    private const int PartnerRange = 1 << 22;

    /// <summary>As <see cref="Of(ReadOnlySpan{int}, int)"/>, listing at most <paramref name="partnerRange"/> steps at a
    /// time (more when one group alone has more): the same traces, bit for bit, whatever the range.</summary>
    public static (double TraceMA, double TraceMA2, int Groups) Of(ReadOnlySpan<int> group, int groups, int partnerRange)
    {
        var n = group.Length;
        var size = new int[groups];
        var boundary = new long[groups];
        var squares = new long[groups];
        var bucket = new int[groups + 1];
        for (var t = 0; t < n; t++)
        {
            var g = group[t];
            size[g]++;
            var left = t > 0 ? group[t - 1] : -1;
            var right = t < n - 1 ? group[t + 1] : -1;
            var own = (left < 0 ? 0 : 1) + (right < 0 ? 0 : 1) - (left == g ? 1 : 0) - (right == g ? 1 : 0);
            squares[g] += own * own;
            var leftOut = left >= 0 && left != g;
            var rightOut = right >= 0 && right != g;
            boundary[g] += (leftOut ? 1 : 0) + (rightOut ? 1 : 0);
            // (A1_c)_t = −(number of t's neighbours in c) for a group c that t is not in
            if (leftOut && left == right)
            {
                squares[left] += 4;
            }
            else
            {
                squares[leftOut ? left : g] += leftOut ? 1 : 0;
                squares[rightOut ? right : g] += rightOut ? 1 : 0;
            }

            if (leftOut)
            {
                bucket[Math.Min(left, g) + 1]++;
            }
        }

        for (var g = 0; g < groups; g++)
        {
            bucket[g + 1] += bucket[g];
        }

        // the steps between groups listed under the lower group, for a range of lower groups at a time (one more pass
        // over the run sequence a range), so the list holds at most PartnerRange steps however long the sequence
        double traceHA = 0, traceHA2 = 0, traceHAHA = 0;
        var p = 0;
        var between = new int[groups];
        var largest = 1;
        for (var g = 0; g < groups; g++)
        {
            largest = Math.Max(largest, bucket[g + 1] - bucket[g]);
        }

        var partner = new int[Math.Min(Math.Max(1, bucket[groups]), Math.Max(largest, partnerRange))];
        for (var first = 0; first < groups;)
        {
            var end = first + 1;
            while (end < groups && bucket[end + 1] - bucket[first] <= partner.Length)
            {
                end++;
            }

            var next = bucket[first..end];
            for (var t = 1; t < n; t++)
            {
                var (a, b) = (group[t - 1], group[t]);
                var lower = Math.Min(a, b);
                if (a != b && lower >= first && lower < end)
                {
                    partner[next[lower - first]++ - bucket[first]] = Math.Max(a, b);
                }
            }

            for (var c = first; c < end; c++)
            {
                if (size[c] == 0)
                {
                    continue;
                }

                p++;
                traceHA += (double)boundary[c] / size[c];
                traceHA2 += (double)squares[c] / size[c];
                traceHAHA += (double)boundary[c] * boundary[c] / ((double)size[c] * size[c]);
                var steps = partner.AsSpan(bucket[c] - bucket[first], bucket[c + 1] - bucket[c]);
                foreach (var other in steps)
                {
                    between[other]++;
                }

                // each pair of distinct groups appears twice in Σ_{c,c'} (1_cᵀA1_c')²/(n_c n_c')
                foreach (var other in steps)
                {
                    var k = between[other];
                    if (k > 0)
                    {
                        traceHAHA += 2.0 * k * k / ((double)size[c] * size[other]);
                        between[other] = 0;
                    }
                }
            }

            first = end;
        }

        var traceMA = (2.0 * (n - 1)) - traceHA;
        var traceMA2 = (6.0 * n) - 8 - (2 * traceHA2) + traceHAHA;
        return (traceMA, traceMA2, p);
    }
}
