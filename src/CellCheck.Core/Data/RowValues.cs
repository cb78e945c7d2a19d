namespace CellCheck.Core.Data;

/// <summary>Plain arrays of the values of an <see cref="IRowValues"/> column, for per-row output.</summary>
internal static class RowValues
{
    /// <summary>The values at <paramref name="rows"/>, as a new array.</summary>
    public static int[] Gather<TColumn>(TColumn column, ReadOnlySpan<int> rows)
        where TColumn : IRowValues
    {
        var result = new int[rows.Length];
        for (var k = 0; k < rows.Length; k++)
        {
            result[k] = column[rows[k]];
        }

        return result;
    }

    /// <summary>Every row's value, as a new array.</summary>
    public static int[] All<TColumn>(TColumn column)
        where TColumn : IRowValues
    {
        var result = new int[column.Length];
        for (var i = 0; i < result.Length; i++)
        {
            result[i] = column[i];
        }

        return result;
    }
}
