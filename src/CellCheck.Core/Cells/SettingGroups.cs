using CellCheck.Core.Data;

namespace CellCheck.Core.Cells;

/// <summary>Groups of rows with identical settings of every factor and block.</summary>
internal static class SettingGroups
{
    /// <summary>Index of each row's identical-settings group (factor cell and block levels), in grouped order, and
    /// the number of groups. Without blocks a setting is a cell; with blocks, the block levels of each cell are
    /// numbered in order of first appearance within the cell (rows are grouped by cell, so one small map per cell).
    /// Computed afresh for each caller and not kept with the partition: at ten million rows the array is 40 MB, and the
    /// two steps that read it (the model checks and the Box-Cox fits) hold it only while they run, which takes about a
    /// tenth of a second each time, instead of keeping it beside every later check.</summary>
    public static (int[] Settings, int Count) Of(CellPartition partition, IReadOnlyList<FactorColumn> blocks) =>
        Compute(partition, blocks, partition.GroupedCodes(blocks));

    /// <summary>The groups from the block codes in grouped order.</summary>
    private static (int[] Settings, int Count) Compute(CellPartition partition, IReadOnlyList<FactorColumn> blocks, IReadOnlyList<LevelCodes> codes)
    {
        var radix = blocks.Select(b => b.Levels.Count + 1).ToArray();
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
            return Sparse(partition, codes, radix, result);
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
                var key = Key(codes, radix, i);
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

    private static long Key(IReadOnlyList<LevelCodes> codes, int[] radix, int i)
    {
        var key = 0L;
        for (var j = 0; j < radix.Length; j++)
        {
            key = (key * radix[j]) + codes[j][i] + 1;
        }

        return key;
    }

    private static (int[] Settings, int Count) Sparse(CellPartition partition, IReadOnlyList<LevelCodes> codes, int[] radix, int[] result)
    {
        var count = 0;
        var local = new Dictionary<long, int>();
        for (var c = 0; c < partition.CellCount; c++)
        {
            local.Clear();
            for (var i = partition.Values.Starts[c]; i < partition.Values.Starts[c + 1]; i++)
            {
                var key = Key(codes, radix, i);
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
