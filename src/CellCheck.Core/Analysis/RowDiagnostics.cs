namespace CellCheck.Core.Analysis;

/// <summary>Per-row diagnostics in cell order: data-file line, cell index, fitted value, residual, internally and
/// externally studentized residuals, leverage and Cook's distance (NaN where leverage is one), and the run position
/// (null when no run order was declared; NaN where missing).</summary>
public sealed record RowDiagnostics(
    int[] Lines,
    int[] Cells,
    double[] Fitted,
    double[] Residuals,
    double[] Studentized,
    double[] StudentizedExternal,
    double[] Leverage,
    double[] CooksDistance)
{
    public double[]? RunOrder { get; init; }

    /// <summary>Block level index of each row per block factor (empty without blocks).</summary>
    public IReadOnlyList<int[]> BlockCodes { get; init; } = [];

    /// <summary>Level labels of each block factor, indexed by the codes in <see cref="BlockCodes"/> (empty without blocks).</summary>
    public IReadOnlyList<IReadOnlyList<string>> BlockLevels { get; init; } = [];
}
