namespace CellCheck.Core.Remedies;

/// <summary>Residual sum of squares about group means (the cell-means model), two-pass per group.</summary>
internal sealed class GroupedRss : IResidualSumOfSquares
{
    private readonly int[] starts;

    /// <param name="starts">Group g holds rows starts[g] .. starts[g + 1] − 1; the last entry is the row count.</param>
    public GroupedRss(int[] starts)
    {
        ArgumentNullException.ThrowIfNull(starts);
        if (starts.Length < 2 || starts[0] != 0)
        {
            throw new ArgumentException("starts must begin at 0 and hold at least one group", nameof(starts));
        }

        this.starts = starts;
    }

    /// <summary>Group boundaries as given to the constructor.</summary>
    public int[] Starts => starts;

    public int Count => starts[^1];

    public int ResidualDf => Count - (starts.Length - 1);

    public double Of(ReadOnlySpan<double> v)
    {
        if (v.Length != Count)
        {
            throw new ArgumentException($"expected {Count} values, got {v.Length}", nameof(v));
        }

        var total = 0.0;
        for (var g = 0; g + 1 < starts.Length; g++)
        {
            var group = v[starts[g]..starts[g + 1]];
            if (group.Length == 0)
            {
                continue;
            }

            var mean = 0.0;
            foreach (var x in group)
            {
                mean += x;
            }

            mean /= group.Length;
            foreach (var x in group)
            {
                total += (x - mean) * (x - mean);
            }
        }

        return total;
    }
}
