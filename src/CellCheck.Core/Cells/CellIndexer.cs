using CellCheck.Core.Data;

namespace CellCheck.Core.Cells;

/// <summary>
/// Gives every usable row a dense cell index, ordered lexicographically by the factors' level indices.
/// Small factorial spaces use a direct table on the mixed-radix index; large ones a hash map, then a sort of the
/// observed combinations.
/// </summary>
internal static class CellIndexer
{
    private const long DirectTableLimit = 1 << 22;

    /// <summary>Fills <paramref name="cellOfRow"/> (−1 for unusable rows) and returns the level codes of each cell, flat.</summary>
    public static int[] Assign(IReadOnlyList<FactorColumn> factors, double[] values, int[] cellOfRow, out int cellCount)
    {
        var radix = new long[factors.Count];
        long space = 1;
        var fits = true;
        for (var f = factors.Count - 1; f >= 0; f--)
        {
            radix[f] = space;
            var levels = Math.Max(1, factors[f].Levels.Count);
            if (space > long.MaxValue / levels)
            {
                fits = false;
                break;
            }

            space *= levels;
        }

        if (!fits)
        {
            throw new NotSupportedException("The factorial space exceeds 2^63 combinations.");
        }

        var keys = new long[values.Length];
        for (var row = 0; row < values.Length; row++)
        {
            keys[row] = -1;
            if (double.IsNaN(values[row]))
            {
                continue;
            }

            long key = 0;
            var usable = true;
            for (var f = 0; f < factors.Count; f++)
            {
                var code = factors[f].Codes[row];
                if (code < 0)
                {
                    usable = false;
                    break;
                }

                key += code * radix[f];
            }

            if (usable)
            {
                keys[row] = key;
            }
        }

        var distinct = space <= DirectTableLimit ? DistinctByTable(keys, space) : DistinctBySort(keys);
        cellCount = distinct.Length;
        var lookup = new Dictionary<long, int>(space <= DirectTableLimit ? 0 : distinct.Length);
        int[]? table = null;
        if (space <= DirectTableLimit)
        {
            table = new int[space];
            for (var c = 0; c < distinct.Length; c++)
            {
                table[distinct[c]] = c;
            }
        }
        else
        {
            for (var c = 0; c < distinct.Length; c++)
            {
                lookup[distinct[c]] = c;
            }
        }

        for (var row = 0; row < keys.Length; row++)
        {
            var key = keys[row];
            cellOfRow[row] = key < 0 ? -1 : table is not null ? table[key] : lookup[key];
        }

        var cellLevels = new int[distinct.Length * factors.Count];
        for (var c = 0; c < distinct.Length; c++)
        {
            var rest = distinct[c];
            for (var f = 0; f < factors.Count; f++)
            {
                cellLevels[(c * factors.Count) + f] = (int)(rest / radix[f]);
                rest %= radix[f];
            }
        }

        return cellLevels;
    }

    private static long[] DistinctByTable(long[] keys, long space)
    {
        var seen = new bool[space];
        var count = 0;
        foreach (var k in keys)
        {
            if (k >= 0 && !seen[k])
            {
                seen[k] = true;
                count++;
            }
        }

        var result = new long[count];
        var at = 0;
        for (long k = 0; k < space; k++)
        {
            if (seen[k])
            {
                result[at++] = k;
            }
        }

        return result;
    }

    private static long[] DistinctBySort(long[] keys)
    {
        var set = new HashSet<long>();
        foreach (var k in keys)
        {
            if (k >= 0)
            {
                set.Add(k);
            }
        }

        var result = set.ToArray();
        Array.Sort(result);
        return result;
    }
}
