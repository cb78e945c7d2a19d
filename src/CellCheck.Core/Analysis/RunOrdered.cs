using CellCheck.Core.Data;

namespace CellCheck.Core.Analysis;

/// <summary>The residuals of the used rows in run order and what the order checks read beside them.</summary>
/// <param name="E">The residuals in run order.</param>
/// <param name="T">Their run positions (the run-order column itself when every row is used in file order).</param>
/// <param name="Rows">The data row at each run position.</param>
/// <param name="Missing">Rows without a run position.</param>
/// <param name="Ties">Positions that share their run position with the one before.</param>
/// <param name="Use">The grouped position of each residual (null when <paramref name="Cells"/> was written directly).</param>
/// <param name="Spare">A working array of one int a data row, free to overwrite, or null.</param>
/// <param name="Cells">The cell of each residual, when written directly; null when it is to be read through <paramref name="Use"/>.</param>
internal sealed record RunOrdered(double[] E, RunPositions T, RunRows Rows, int Missing, int Ties, int[]? Use, int[]? Spare, int[]? Cells);
