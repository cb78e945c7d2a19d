namespace CellCheck.Core.Models;

/// <summary>Copies chosen columns (and optionally rows) of a matrix.</summary>
public static class MatrixColumns
{
    /// <summary>The columns <paramref name="kept"/> of <paramref name="x"/>, for the rows <paramref name="rows"/> (all rows when null), in the given orders.</summary>
    public static double[,] Select(double[,] x, int[] kept, int[]? rows = null)
    {
        ArgumentNullException.ThrowIfNull(x);
        ArgumentNullException.ThrowIfNull(kept);
        var n = rows?.Length ?? x.GetLength(0);
        var result = new double[n, kept.Length];
        for (var i = 0; i < n; i++)
        {
            var source = rows is null ? i : rows[i];
            for (var k = 0; k < kept.Length; k++)
            {
                result[i, k] = x[source, kept[k]];
            }
        }

        return result;
    }
}
