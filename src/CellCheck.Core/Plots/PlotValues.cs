namespace CellCheck.Core.Plots;

/// <summary>Values of a panel gathered from per-row columns, without copying what is not drawn.</summary>
internal static class PlotValues
{
    /// <summary>The values at the given rows, in their order.</summary>
    public static double[] Gather(double[] values, int[] rows)
    {
        var result = new double[rows.Length];
        for (var k = 0; k < rows.Length; k++)
        {
            result[k] = values[rows[k]];
        }

        return result;
    }

    /// <summary>The smallest and largest of the values at <paramref name="rows"/> (all when null), compared as
    /// <see cref="Enumerable.Min(IEnumerable{double})"/> and Max compare finite values: the first of equal extremes kept.</summary>
    public static (double Low, double High) Range(double[] values, int[]? rows = null)
    {
        var count = rows?.Length ?? values.Length;
        var low = values[rows is null ? 0 : rows[0]];
        var high = low;
        for (var k = 1; k < count; k++)
        {
            var v = values[rows is null ? k : rows[k]];
            low = v < low ? v : low;
            high = v > high ? v : high;
        }

        return (low, high);
    }
}
