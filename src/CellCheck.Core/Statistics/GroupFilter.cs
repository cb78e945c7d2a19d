namespace CellCheck.Core.Statistics;

/// <summary>Selects the groups that take part in a spread test.</summary>
internal static class GroupFilter
{
    /// <summary>
    /// The groups with at least <paramref name="minimumSize"/> values, in order. Returns the input itself when every
    /// group qualifies; otherwise one compacted copy (a single allocation, not one per group).
    /// </summary>
    public static GroupedValues AtLeast(GroupedValues groups, int minimumSize)
    {
        var kept = 0;
        var count = 0;
        for (var g = 0; g < groups.GroupCount; g++)
        {
            if (groups.Size(g) >= minimumSize)
            {
                kept++;
                count += groups.Size(g);
            }
        }

        if (kept == groups.GroupCount)
        {
            return groups;
        }

        var values = new double[count];
        var starts = new int[kept + 1];
        var j = 0;
        for (var g = 0; g < groups.GroupCount; g++)
        {
            if (groups.Size(g) >= minimumSize)
            {
                groups.Group(g).CopyTo(values.AsSpan(starts[j]));
                starts[j + 1] = starts[j] + groups.Size(g);
                j++;
            }
        }

        return new GroupedValues(values, starts);
    }

    /// <summary>The number of groups with at least <paramref name="minimumSize"/> values.</summary>
    public static int CountAtLeast(GroupedValues groups, int minimumSize)
    {
        var count = 0;
        for (var g = 0; g < groups.GroupCount; g++)
        {
            if (groups.Size(g) >= minimumSize)
            {
                count++;
            }
        }

        return count;
    }

    /// <summary>The size of the largest group (0 when there are none).</summary>
    public static int LargestSize(GroupedValues groups)
    {
        var largest = 0;
        for (var g = 0; g < groups.GroupCount; g++)
        {
            largest = Math.Max(largest, groups.Size(g));
        }

        return largest;
    }

    /// <summary>The reason a test on absolute deviations cannot run on these (already filtered) groups, or null:
    /// fewer than two groups, or every group of two values (the deviations are equal within each pair).</summary>
    public static string? DeviationTestObstacle(GroupedValues part) =>
        part.GroupCount < 2 ? NotTestableReason.TooFewGroups : LargestSize(part) == 2 ? NotTestableReason.AllGroupsOfTwo : null;
}
