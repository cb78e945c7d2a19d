namespace CellCheck.Core.Statistics;

/// <summary>
/// Each group's part of a one-way ANOVA table (size, mean, within-group sum of squares), filled group by group in any
/// order (each group writes only its own slots) and combined in group order into the same table, bit for bit, as
/// <see cref="OneWayAnova.Compute"/> on the values laid out group by group.
/// </summary>
internal sealed class GroupAnovaParts
{
    private readonly int[] _sizes;
    private readonly double[] _means;
    private readonly double[] _within;

    public GroupAnovaParts(int groups)
    {
        _sizes = new int[groups];
        _means = new double[groups];
        _within = new double[groups];
    }

    /// <summary>Total number of values over the groups set so far.</summary>
    public int Count
    {
        get
        {
            var n = 0;
            foreach (var size in _sizes)
            {
                n += size;
            }

            return n;
        }
    }

    /// <summary>Records group <paramref name="g"/>'s values (an empty span leaves the group out, as an empty group).</summary>
    public void Set(int g, ReadOnlySpan<double> y)
    {
        _sizes[g] = y.Length;
        if (!y.IsEmpty)
        {
            (_means[g], _within[g]) = OneWayAnova.Summarise(y);
        }
    }

    /// <summary>The table of all groups.</summary>
    public AnovaTable Table() => OneWayAnova.FromSummaries(_sizes, _means, _within);
}
