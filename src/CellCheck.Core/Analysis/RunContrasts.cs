using CellCheck.Core.Data;

namespace CellCheck.Core.Analysis;

/// <summary>A block factor's contrast column (see <see cref="Models.CellBlockFit.LevelColumns"/>) read position by
/// position of the run sequence, through the block's level codes: built into narrow codes without a full-width copy.</summary>
internal readonly struct RunContrasts(LevelCodes codes, int[] contrast, RunRows rows, int length) : IRowValues
{
    public int Length => length;

    public int this[int row] => contrast[codes[rows[row]]];
}
