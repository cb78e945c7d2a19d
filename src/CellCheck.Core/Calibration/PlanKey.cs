namespace CellCheck.Core.Calibration;

/// <summary>A cache key for a model plan: FNV-1a (64-bit) over the bits of the design matrix and the cell boundaries.</summary>
public static class PlanKey
{
    public static string Of(double[,] x, int[] cellStarts)
    {
        ArgumentNullException.ThrowIfNull(x);
        ArgumentNullException.ThrowIfNull(cellStarts);
        var hash = 14695981039346656037UL;
        void Mix(ulong value)
        {
            for (var b = 0; b < 8; b++)
            {
                hash = unchecked((hash ^ ((value >> (8 * b)) & 0xFF)) * 1099511628211UL);
            }
        }

        Mix((ulong)x.GetLength(0));
        Mix((ulong)x.GetLength(1));
        foreach (var v in x)
        {
            Mix((ulong)BitConverter.DoubleToInt64Bits(v));
        }

        foreach (var s in cellStarts)
        {
            Mix((ulong)s);
        }

        return "model:" + hash.ToString("x16", System.Globalization.CultureInfo.InvariantCulture);
    }
}
