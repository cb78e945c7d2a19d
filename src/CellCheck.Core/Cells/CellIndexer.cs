using CellCheck.Core.Data;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Cells;

/// <summary>
/// Gives every usable row a dense cell index, ordered lexicographically by the factors' level indices.
/// Small factorial spaces use a direct table on the mixed-radix index; large ones a hash map, then a sort of the
/// observed combinations. On long data the table's passes take ranges of rows side by side (each row on its own).
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

        var codes = new LevelCodes[factors.Count];
        for (var f = 0; f < codes.Length; f++)
        {
            codes[f] = factors[f].Codes;
        }

        var distinct = space <= DirectTableLimit ? AssignByTable(codes, radix, values, cellOfRow, (int)space) : AssignBySort(codes, radix, values, cellOfRow);
        cellCount = distinct.Length;
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

    /// <summary>The mixed-radix key of a row's cell, or −1 when its value is missing or a factor level is.</summary>
    private static long Key(LevelCodes[] codes, long[] radix, double[] values, int row)
    {
        if (double.IsNaN(values[row]))
        {
            return -1;
        }

        long key = 0;
        for (var f = 0; f < codes.Length; f++)
        {
            var code = codes[f][row];
            if (code < 0)
            {
                return -1;
            }

            key += code * radix[f];
        }

        return key;
    }

    /// <summary>A factorial space small enough for a table: the keys are written where the cell indices go, marked as
    /// seen, then replaced by their rank among the seen keys.</summary>
    private static long[] AssignByTable(LevelCodes[] codes, long[] radix, double[] values, int[] cellOfRow, int space)
    {
        var table = new int[space]; // 1 where a key is seen, then the key's cell index
        // each row on its own, ranges of rows side by side (a key seen in two ranges is marked 1 by both)
        GroupChunks.ForEachRange(values.Length, (from, to) =>
        {
            for (var row = from; row < to; row++)
            {
                var key = (int)Key(codes, radix, values, row);
                cellOfRow[row] = key;
                if (key >= 0)
                {
                    table[key] = 1;
                }
            }
        });

        var distinct = new List<long>();
        for (var k = 0; k < space; k++)
        {
            if (table[k] != 0)
            {
                table[k] = distinct.Count;
                distinct.Add(k);
            }
        }

        GroupChunks.ForEachRange(cellOfRow.Length, (from, to) =>
        {
            for (var row = from; row < to; row++)
            {
                var key = cellOfRow[row];
                cellOfRow[row] = key < 0 ? -1 : table[key];
            }
        });

        return [.. distinct];
    }

    /// <summary>A factorial space too large for a table: the distinct keys are sorted and looked up by hash.</summary>
    private static long[] AssignBySort(LevelCodes[] codes, long[] radix, double[] values, int[] cellOfRow)
    {
        var keys = new long[values.Length];
        var set = new HashSet<long>();
        for (var row = 0; row < values.Length; row++)
        {
            keys[row] = Key(codes, radix, values, row);
            if (keys[row] >= 0)
            {
                set.Add(keys[row]);
            }
        }

        var distinct = set.ToArray();
        Array.Sort(distinct);
        var lookup = new Dictionary<long, int>(distinct.Length);
        for (var c = 0; c < distinct.Length; c++)
        {
            lookup[distinct[c]] = c;
        }

        for (var row = 0; row < keys.Length; row++)
        {
            cellOfRow[row] = keys[row] < 0 ? -1 : lookup[keys[row]];
        }

        return distinct;
    }
}
