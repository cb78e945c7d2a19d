namespace CellCheck.Core.Statistics;

/// <summary>
/// Values laid out contiguously group by group (the layout a counting sort on the cell index produces):
/// group g holds <c>Values[Starts[g] .. Starts[g + 1]]</c>. Holds references, copies nothing.
/// </summary>
public sealed class GroupedValues
{
    /// <summary>Creates a grouped view. <paramref name="starts"/> has one entry more than there are groups,
    /// starts at 0, never decreases, and ends at <c>values.Length</c>.</summary>
    public GroupedValues(double[] values, int[] starts)
    {
        ArgumentNullException.ThrowIfNull(values);
        ArgumentNullException.ThrowIfNull(starts);
        if (starts.Length < 1 || starts[0] != 0 || starts[^1] != values.Length)
        {
            throw new ArgumentException("starts must begin at 0 and end at values.Length", nameof(starts));
        }

        for (var i = 1; i < starts.Length; i++)
        {
            if (starts[i] < starts[i - 1])
            {
                throw new ArgumentException("starts must not decrease", nameof(starts));
            }
        }

        Values = values;
        Starts = starts;
    }

    /// <summary>All values, group by group.</summary>
    public double[] Values { get; }

    /// <summary>Group boundaries: group g is <c>[Starts[g], Starts[g + 1])</c>.</summary>
    public int[] Starts { get; }

    /// <summary>Number of groups (some may be empty).</summary>
    public int GroupCount => Starts.Length - 1;

    /// <summary>Total number of values.</summary>
    public int Count => Values.Length;

    /// <summary>Size of group g.</summary>
    public int Size(int g) => Starts[g + 1] - Starts[g];

    /// <summary>The values of group g.</summary>
    public ReadOnlySpan<double> Group(int g) => Values.AsSpan(Starts[g], Starts[g + 1] - Starts[g]);

    /// <summary>Builds grouped values from separate arrays (convenient for tests and small inputs).</summary>
    public static GroupedValues FromGroups(IReadOnlyList<double[]> groups)
    {
        ArgumentNullException.ThrowIfNull(groups);
        var starts = new int[groups.Count + 1];
        for (var g = 0; g < groups.Count; g++)
        {
            starts[g + 1] = starts[g] + groups[g].Length;
        }

        var values = new double[starts[^1]];
        for (var g = 0; g < groups.Count; g++)
        {
            groups[g].CopyTo(values, starts[g]);
        }

        return new GroupedValues(values, starts);
    }
}
