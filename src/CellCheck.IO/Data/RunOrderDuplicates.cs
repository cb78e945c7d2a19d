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
        if (data.RunOrder is not { } order || data.Blocks.Count == 0)
        {
            return null;
        }

        var seen = new Dictionary<double, int>();
        for (var row = 0; row < order.Length; row++)
        {
            if (double.IsNaN(order[row]))
            {
                continue;
            }

            if (seen.TryGetValue(order[row], out var first) && data.Blocks.Any(b => b.Codes[first] != b.Codes[row]))
            {
                return new Problem(ProblemCodes.DuplicateRun, design.DataPath, data.SourceLines[row], null,
                    $"Run position {order[row].ToString(System.Globalization.CultureInfo.InvariantCulture)} is also on line {data.SourceLines[first]}, in another block.",
                    "Runs made at the same time belong to one block; correct the run order or the block of one of the two rows.") { ColumnName = design.RunOrder!.Column };
            }

            seen.TryAdd(order[row], row);
        }

        return null;
    }
}
