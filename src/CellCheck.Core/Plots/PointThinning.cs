namespace CellCheck.Core.Plots;

/// <summary>
/// Which points a pooled panel draws when there are more than <see cref="MaxPoints"/>: a picture of ten million dots
/// shows no more than one of twenty thousand, and its SVG would not open. Kept are the most extreme points at both
/// ends and an even, deterministic spread of the rest, so the shape, the tails and every outlier stay visible; the
/// panel's note says how many points are drawn. Every row stays in diagnostics.csv.
/// </summary>
public static class PointThinning
{
    /// <summary>Most points a pooled panel draws.</summary>
    public const int MaxPoints = 20_000;

    /// <summary>Points kept at each end (by rank, or by size of |y|).</summary>
    public const int Extremes = 1_000;

    /// <summary>Ranks 0..n − 1 to draw of n sorted values: all when n ≤ <see cref="MaxPoints"/>, otherwise the
    /// <see cref="Extremes"/> lowest and highest and evenly spaced ranks between them.</summary>
    public static int[] Ranks(int n)
    {
        if (n <= MaxPoints)
        {
            return Enumerable.Range(0, n).ToArray();
        }

        var inner = MaxPoints - (2 * Extremes);
        var ranks = new List<int>(MaxPoints);
        ranks.AddRange(Enumerable.Range(0, Extremes));
        var step = (double)(n - (2 * Extremes)) / inner;
        for (var k = 0; k < inner; k++)
        {
            ranks.Add(Extremes + (int)(k * step));
        }

        ranks.AddRange(Enumerable.Range(n - Extremes, Extremes));
        return ranks.Distinct().Order().ToArray();
    }

    /// <summary>Positions 0..ys.Length − 1 to draw: all when few, otherwise the <see cref="Extremes"/> largest |y|, every
    /// position in <paramref name="always"/>, and every k-th of the others; ascending.</summary>
    public static int[] Positions(IReadOnlyList<double> ys, ISet<int> always)
    {
        ArgumentNullException.ThrowIfNull(ys);
        ArgumentNullException.ThrowIfNull(always);
        var n = ys.Count;
        if (n <= MaxPoints)
        {
            return Enumerable.Range(0, n).ToArray();
        }

        var keep = Largest(ys, Extremes);
        keep.UnionWith(always);
        var stride = (double)n / (MaxPoints - Extremes);
        for (var k = 0; k < MaxPoints - Extremes; k++)
        {
            keep.Add((int)(k * stride));
        }

        return keep.Order().ToArray();
    }

    /// <summary>The positions of the <paramref name="count"/> largest |y| (of equal |y|, the earlier position), in one
    /// pass that keeps the largest so far in a heap whose root is the smallest of them: at ten million values a few
    /// thousand heap updates instead of sorting every value.</summary>
    private static HashSet<int> Largest(IReadOnlyList<double> ys, int count)
    {
        // "weaker" first: smaller |y|, or equal |y| at a later position
        var weaker = Comparer<(double Magnitude, int Position)>.Create((a, b) =>
            a.Magnitude != b.Magnitude ? a.Magnitude.CompareTo(b.Magnitude) : b.Position.CompareTo(a.Position));
        var heap = new PriorityQueue<int, (double Magnitude, int Position)>(count + 1, weaker);
        for (var i = 0; i < ys.Count; i++)
        {
            var key = (Math.Abs(ys[i]), i);
            if (heap.Count < count)
            {
                heap.Enqueue(i, key);
            }
            else if (heap.TryPeek(out _, out var weakest) && weaker.Compare(key, weakest) > 0)
            {
                heap.DequeueEnqueue(i, key);
            }
        }

        return [.. heap.UnorderedItems.Select(item => item.Element)];
    }

    /// <summary>The note under a picture whose pooled panels were thinned.</summary>
    public static string Note(int total) =>
        "Pooled panels draw at most " + Analysis.NumberText.Count(MaxPoints) + " of the " + Analysis.NumberText.Count(total)
        + " points: the most extreme at both ends, every outlier and an even spread of the rest (every row is in diagnostics.csv).";
}
