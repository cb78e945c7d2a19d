using CellCheck.Core.Statistics;

namespace CellCheck.Core.Plots;

/// <summary>The rows of a picture put in run order (in the order of the rows given where positions tie; the order
/// checks' <see cref="Analysis.RunSequence"/> keeps file order instead).</summary>
internal static class RunPlacement
{
    /// <summary>Of <paramref name="rows"/>, those with a finite run position, in run order; rows that share a position
    /// keep their order in <paramref name="rows"/> (stable). Whole-number positions spread over at most about twice as
    /// many numbers as rows (runs numbered 1, 2, 3, …, with gaps or repeats) are placed by a counting sort, two passes;
    /// any others by the stable radix sort from its threshold on (which the counting sort equals; a negative zero, which
    /// the radix sort puts before zero, goes that way too), and below it by a comparison sort that breaks ties by
    /// order in <paramref name="rows"/>.</summary>
    public static int[] Placed(double[] runOrder, int[] rows)
    {
        ArgumentNullException.ThrowIfNull(runOrder);
        ArgumentNullException.ThrowIfNull(rows);
        var placed = new int[Count(runOrder, rows)];
        var (low, high, whole) = (double.PositiveInfinity, double.NegativeInfinity, true);
        var n = 0;
        foreach (var row in rows)
        {
            var t = runOrder[row];
            if (double.IsFinite(t))
            {
                placed[n++] = row;
                (low, high) = (Math.Min(low, t), Math.Max(high, t));
                whole &= t == Math.Floor(t) && !(t == 0 && double.IsNegative(t));
            }
        }

        if (n == 0)
        {
            return placed;
        }

        if (whole && high - low <= (2.0 * n) + 1024)
        {
            return Counted(runOrder, placed, low, (int)(high - low) + 1);
        }

        var positions = new double[n];
        for (var k = 0; k < n; k++)
        {
            positions[k] = runOrder[placed[k]];
        }

        if (n >= RadixSort.Threshold)
        {
            RadixOrder.Sort(positions, placed);
            return placed;
        }

        // below the radix sort's threshold it would use an unstable comparison sort: equal positions by their order here
        var order = Enumerable.Range(0, n).ToArray();
        Array.Sort(order, (a, b) => positions[a] != positions[b] ? positions[a].CompareTo(positions[b]) : a.CompareTo(b));
        return Array.ConvertAll(order, k => placed[k]);
    }

    private static int Count(double[] runOrder, int[] rows)
    {
        var count = 0;
        foreach (var row in rows)
        {
            count += double.IsFinite(runOrder[row]) ? 1 : 0;
        }

        return count;
    }

    /// <summary>The rows placed by their position's offset from <paramref name="low"/> (0 .. <paramref name="size"/> − 1), stable.</summary>
    private static int[] Counted(double[] runOrder, int[] placed, double low, int size)
    {
        var start = new int[size + 1];
        foreach (var row in placed)
        {
            start[(int)(runOrder[row] - low) + 1]++;
        }

        for (var k = 0; k < size; k++)
        {
            start[k + 1] += start[k];
        }

        var result = new int[placed.Length];
        foreach (var row in placed)
        {
            result[start[(int)(runOrder[row] - low)]++] = row;
        }

        return result;
    }
}
