using CellCheck.Core.Data;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Cells;

/// <summary>
/// The rows of one response split into cells (sets of rows with identical values on every factor), by a counting
/// sort on a dense cell index: the values of cell c are <c>Values.Group(c)</c> and the data rows they came from are
/// <c>RowOrder[Starts[c] .. Starts[c + 1]]</c>. Cells are ordered lexicographically by level index, factor by factor.
/// </summary>
public sealed class CellPartition
{
    private readonly int[] _cellLevels;

    private CellPartition(IReadOnlyList<FactorColumn> factors, int[] cellLevels, int[] rowOrder, GroupedValues values)
    {
        Factors = factors;
        _cellLevels = cellLevels;
        RowOrder = rowOrder;
        Values = values;
    }

    /// <summary>The factors that define the cells.</summary>
    public IReadOnlyList<FactorColumn> Factors { get; }

    /// <summary>Number of observed (non-empty) cells.</summary>
    public int CellCount => Values.GroupCount;

    /// <summary>Response values grouped by cell (relative to the response origin).</summary>
    public GroupedValues Values { get; }

    /// <summary>Data row index of each grouped value.</summary>
    public int[] RowOrder { get; }

    /// <summary>Number of values in cell c.</summary>
    public int Size(int cell) => Values.Size(cell);

    /// <summary>The cell of each position in grouped order.</summary>
    public int[] CellOfGroupedIndex()
    {
        var cells = new int[RowOrder.Length];
        for (var c = 0; c < CellCount; c++)
        {
            Array.Fill(cells, c, Values.Starts[c], Size(c));
        }

        return cells;
    }

    /// <summary>Level index of factor f in cell c.</summary>
    public int LevelCode(int cell, int factor) => _cellLevels[(cell * Factors.Count) + factor];

    /// <summary>Level labels of cell c, one per factor, as written in the data file.</summary>
    public IReadOnlyList<string> Levels(int cell)
    {
        var labels = new string[Factors.Count];
        for (var f = 0; f < labels.Length; f++)
        {
            labels[f] = Factors[f].Levels[LevelCode(cell, f)];
        }

        return labels;
    }

    /// <summary>
    /// Splits the rows that have a value (not NaN), a level on every factor and on every block into cells.
    /// </summary>
    public static CellPartition Build(IReadOnlyList<FactorColumn> factors, double[] values, IReadOnlyList<FactorColumn>? blocks = null)
    {
        ArgumentNullException.ThrowIfNull(factors);
        ArgumentNullException.ThrowIfNull(values);
        if (blocks is { Count: > 0 })
        {
            // a row without a block level cannot enter the model: treat it like a missing value
            values = (double[])values.Clone();
            for (var row = 0; row < values.Length; row++)
            {
                if (blocks.Any(b => b.Codes[row] < 0))
                {
                    values[row] = double.NaN;
                }
            }
        }

        var cellOfRow = new int[values.Length];
        var cellLevels = CellIndexer.Assign(factors, values, cellOfRow, out var cellCount);

        var starts = new int[cellCount + 1];
        foreach (var c in cellOfRow)
        {
            if (c >= 0)
            {
                starts[c + 1]++;
            }
        }

        for (var c = 0; c < cellCount; c++)
        {
            starts[c + 1] += starts[c];
        }

        var next = starts[..^1];
        var rowOrder = new int[starts[^1]];
        var grouped = new double[starts[^1]];
        for (var row = 0; row < cellOfRow.Length; row++)
        {
            var c = cellOfRow[row];
            if (c < 0)
            {
                continue;
            }

            var at = next[c]++;
            rowOrder[at] = row;
            grouped[at] = values[row];
        }

        return new CellPartition(factors, cellLevels, rowOrder, new GroupedValues(grouped, starts));
    }
}
