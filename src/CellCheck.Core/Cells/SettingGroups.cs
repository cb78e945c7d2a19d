using CellCheck.Core.Data;

namespace CellCheck.Core.Cells;

/// <summary>Groups of rows with identical settings of every factor and block.</summary>
internal static class SettingGroups
{
    /// <summary>Index of each row's identical-settings group (factor cell and block levels), in grouped order, and
    /// the number of groups. Without blocks a setting is a cell; with blocks, the block levels of each cell are
    /// numbered in order of first appearance within the cell (rows are grouped by cell, so one small map per cell).</summary>
    public static (int[] Settings, int Count) Of(CellPartition partition, IReadOnlyList<FactorColumn> blocks)
    {
        var result = new int[partition.RowOrder.Length];
        if (blocks.Count == 0)
        {
            for (var c = 0; c < partition.CellCount; c++)
            {
                Array.Fill(result, c, partition.Values.Starts[c], partition.Size(c));
            }

            return (result, partition.CellCount);
        }

        // block levels as one mixed-radix key; a dense key → setting map, cleared cell by cell through the keys touched
        var keys = blocks.Aggregate(1L, (product, b) => product * (b.Levels.Count + 1));
        var count = 0;
        if (keys > 1 << 24)
        {
            return Sparse(partition, blocks, result);
        }

        var map = new int[keys];
        Array.Fill(map, -1);
        var touched = new List<long>();
        for (var c = 0; c < partition.CellCount; c++)
        {
            foreach (var key in touched)
            {
                map[key] = -1;
            }

            touched.Clear();
            for (var i = partition.Values.Starts[c]; i < partition.Values.Starts[c + 1]; i++)
            {
                var key = Key(blocks, partition.RowOrder[i]);
                if (map[key] < 0)
                {
                    map[key] = count++;
                    touched.Add(key);
                }

                result[i] = map[key];
            }
        }

        return (result, count);
    }

    private static long Key(IReadOnlyList<FactorColumn> blocks, int row)
    {
        var key = 0L;
        for (var j = 0; j < blocks.Count; j++)
        {
            key = (key * (blocks[j].Levels.Count + 1)) + blocks[j].Codes[row] + 1;
        }

        return key;
    }

    private static (int[] Settings, int Count) Sparse(CellPartition partition, IReadOnlyList<FactorColumn> blocks, int[] result)
    {
        var count = 0;
        var local = new Dictionary<long, int>();
        for (var c = 0; c < partition.CellCount; c++)
        {
            local.Clear();
            for (var i = partition.Values.Starts[c]; i < partition.Values.Starts[c + 1]; i++)
            {
                var key = Key(blocks, partition.RowOrder[i]);
                if (!local.TryGetValue(key, out var g))
                {
                    g = count++;
                    local.Add(key, g);
                }

                result[i] = g;
            }
        }

        return (result, count);
    }
}
