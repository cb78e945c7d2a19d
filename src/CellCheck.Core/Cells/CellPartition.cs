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

    private CellPartition(IReadOnlyList<FactorColumn> factors, int[] cellLevels, int[] rowOrder, GroupedValues values,
        IReadOnlyList<FactorColumn> blocks, IReadOnlyList<LevelCodes> blockCodes)
    {
        Factors = factors;
        _cellLevels = cellLevels;
        RowOrder = rowOrder;
        Values = values;
        Blocks = blocks;
        BlockCodes = blockCodes;
    }

    /// <summary>The block factors the partition was built with (rows without a block level are left out).</summary>
    public IReadOnlyList<FactorColumn> Blocks { get; }

    /// <summary>Per block factor, the level index of each grouped value (the block codes in grouped order).</summary>
    public IReadOnlyList<LevelCodes> BlockCodes { get; }

    /// <summary>The factors that define the cells.</summary>
    public IReadOnlyList<FactorColumn> Factors { get; }

    /// <summary>Number of observed (non-empty) cells.</summary>
    public int CellCount => Values.GroupCount;

    /// <summary>Response values grouped by cell (relative to the response origin).</summary>
    public GroupedValues Values { get; }

    /// <summary>Data row index of each grouped value.</summary>
    public int[] RowOrder { get; }

    /// <summary>The level index of each grouped value on each of the given block factors: the partition's own codes
    /// when these are its blocks, otherwise gathered through <see cref="RowOrder"/>.</summary>
    public IReadOnlyList<LevelCodes> GroupedCodes(IReadOnlyList<FactorColumn> blocks)
    {
        ArgumentNullException.ThrowIfNull(blocks);
        return IsOwn(blocks) ? BlockCodes : blocks.Select(b => b.Codes.Gathered(RowOrder)).ToArray();
    }

    /// <summary>True when <paramref name="blocks"/> are the blocks the partition was built with.</summary>
    internal bool IsOwn(IReadOnlyList<FactorColumn> blocks)
    {
        if (blocks.Count != Blocks.Count)
        {
            return false;
        }

        for (var b = 0; b < blocks.Count; b++)
        {
            if (!ReferenceEquals(blocks[b], Blocks[b]))
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>Number of values in cell c.</summary>
    public int Size(int cell) => Values.Size(cell);

    /// <summary>The cell of each position in grouped order.</summary>
    public int[] CellOfGroupedIndex()
    {
        var cells = new int[RowOrder.Length];
        WriteCellOfGroupedIndex(cells);
        return cells;
    }

    /// <summary>As <see cref="CellOfGroupedIndex()"/>, written into the first positions of <paramref name="target"/>.</summary>
    internal void WriteCellOfGroupedIndex(Span<int> target)
    {
        for (var c = 0; c < CellCount; c++)
        {
            target.Slice(Values.Starts[c], Size(c)).Fill(c);
        }
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
        blocks ??= [];
        double[]? masked = null;
        foreach (var block in blocks)
        {
            // a row without a block level cannot enter the model: treat it like a missing value
            var codes = block.Codes;
            for (var row = 0; row < codes.Length; row++)
            {
                if (codes[row] < 0)
                {
                    masked ??= (double[])values.Clone();
                    masked[row] = double.NaN;
                }
            }
        }

        values = masked ?? values;

        var cellOfRow = GC.AllocateUninitializedArray<int>(values.Length); // every row written by the indexer
        var cellLevels = CellIndexer.Assign(factors, values, cellOfRow, out var cellCount);

        var blockSource = new LevelCodes[blocks.Count];
        for (var b = 0; b < blocks.Count; b++)
        {
            blockSource[b] = blocks[b].Codes;
        }

        var (starts, rowOrder, grouped, blockCodes) = CellSort.Sort(cellOfRow, cellCount, values, blockSource);
        return new CellPartition(factors, cellLevels, rowOrder, new GroupedValues(grouped, starts), blocks, blockCodes);
    }
}
