namespace CellCheck.Core.Statistics;

/// <summary>
/// Runs work over consecutive ranges of groups (or of positions), side by side on large data. Each range holds whole groups and at least
/// <see cref="ChunkRows"/> values (bar the last), so the result of work that writes only its own groups' slots does
/// not depend on the ranges or their scheduling.
/// </summary>
internal static class GroupChunks
{
    /// <summary>Values per range; data with fewer values is done in one range on the calling thread.</summary>
    public const int ChunkRows = 1 << 16;

    /// <summary>Calls <paramref name="body"/>(first group, end group) once per range.</summary>
    public static void ForEach(int[] starts, Action<int, int> body)
    {
        var groups = starts.Length - 1;
        var bounds = Bounds(starts);
        if (bounds.Count == 2)
        {
            body(0, groups);
            return;
        }

        Parallel.For(0, bounds.Count - 1, r => body(bounds[r], bounds[r + 1]));
    }

    /// <summary>Where each range of <see cref="ForEach"/> starts (a group number), and the number of groups: whole groups,
    /// at least <see cref="ChunkRows"/> values a range bar the last.</summary>
    public static List<int> Bounds(int[] starts)
    {
        var groups = starts.Length - 1;
        var bounds = new List<int> { 0 };
        for (var g = 0; g < groups; g++)
        {
            if (starts[g + 1] - starts[bounds[^1]] >= ChunkRows && g + 1 < groups)
            {
                bounds.Add(g + 1);
            }
        }

        bounds.Add(groups);
        return bounds;
    }

    /// <summary>Calls <paramref name="body"/>(from, to) once per range of <see cref="ChunkRows"/> consecutive positions of
    /// <paramref name="count"/> (fewer in the last), side by side; fewer positions in one range on the calling thread.
    /// For work where each position is done on its own.</summary>
    public static void ForEachRange(int count, Action<int, int> body)
    {
        if (count <= ChunkRows)
        {
            body(0, count);
            return;
        }

        Parallel.For(0, (count + ChunkRows - 1) / ChunkRows, r => body(r * ChunkRows, Math.Min(count, (r + 1) * ChunkRows)));
    }

    /// <summary>The size of the largest of groups <paramref name="first"/> to <paramref name="end"/> − 1.</summary>
    public static int LargestSize(int[] starts, int first, int end)
    {
        var largest = 0;
        for (var g = first; g < end; g++)
        {
            largest = Math.Max(largest, starts[g + 1] - starts[g]);
        }

        return largest;
    }
}
