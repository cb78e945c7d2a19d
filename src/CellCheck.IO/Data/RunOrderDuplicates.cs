using CellCheck.Core.Data;
using CellCheck.Core.Problems;
using CellCheck.IO.Design;

namespace CellCheck.IO.Data;

/// <summary>
/// Finds run positions shared by rows of different blocks: units run at once belong to one block, so such a
/// duplicate looks like a recording error and is a located problem. Shared positions within a block are ties.
/// </summary>
internal static class RunOrderDuplicates
{
    public static Problem? Find(DesignFile design, DesignData data)
    {
        if (data.RunOrder is not { } order || data.Blocks.Count == 0 || order.IsConsecutive) // consecutive positions are all different
        {
            return null;
        }

        // rows grouped by run position, file order kept within a position: no sort when the file is in run order
        var rows = new int[order.Length];
        var count = 0;
        var sorted = true;
        for (var row = 0; row < order.Length; row++)
        {
            if (!double.IsNaN(order[row]))
            {
                sorted &= count == 0 || order[row] >= order[rows[count - 1]];
                rows[count++] = row;
            }
        }

        if (!sorted)
        {
            var keys = new double[count];
            for (var k = 0; k < count; k++)
            {
                keys[k] = order[rows[k]];
            }

            Array.Sort(keys, rows, 0, count);
            for (var a = 0; a < count;)
            {
                var b = a + 1;
                while (b < count && keys[b] == keys[a])
                {
                    b++;
                }

                Array.Sort(rows, a, b - a);
                a = b;
            }
        }

        // the first row (in file order) that repeats an earlier row's position in another block
        var offending = -1;
        var firstOf = -1;
        for (var a = 0; a < count;)
        {
            var b = a + 1;
            while (b < count && order[rows[b]] == order[rows[a]])
            {
                b++;
            }

            for (var k = a + 1; k < b; k++)
            {
                if ((offending < 0 || rows[k] < offending) && OtherBlock(data, rows[a], rows[k]))
                {
                    (offending, firstOf) = (rows[k], rows[a]);
                    break;
                }
            }

            a = b;
        }

        if (offending >= 0)
        {
            return new Problem(ProblemCodes.DuplicateRun, design.DataPath, data.SourceLines[offending], null,
                $"Run position {order[offending].ToString(System.Globalization.CultureInfo.InvariantCulture)} is also on line {data.SourceLines[firstOf]}, in another block.",
                "Runs made at the same time belong to one block; correct the run order or the block of one of the two rows.") { ColumnName = design.RunOrder!.Column };
        }

        return null;
    }

    private static bool OtherBlock(DesignData data, int first, int row)
    {
        foreach (var block in data.Blocks)
        {
            if (block.Codes[first] != block.Codes[row])
            {
                return true;
            }
        }

        return false;
    }
}
