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

        var count = 0;
        var local = new Dictionary<long, int>();
        for (var c = 0; c < partition.CellCount; c++)
        {
            local.Clear();
            for (var i = partition.Values.Starts[c]; i < partition.Values.Starts[c + 1]; i++)
            {
                var row = partition.RowOrder[i];
                var key = 0L;
                foreach (var b in blocks)
                {
                    key = (key * (b.Levels.Count + 1)) + b.Codes[row] + 1;
                }

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
