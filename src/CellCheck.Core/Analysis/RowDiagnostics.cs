namespace CellCheck.Core.Analysis;

/// <summary>Per-row diagnostics in cell order: data-file line, cell index, fitted value, residual, internally and
/// externally studentized residuals, leverage and Cook's distance (NaN where leverage is one).</summary>
public sealed record RowDiagnostics(
    int[] Lines,
    int[] Cells,
    double[] Fitted,
    double[] Residuals,
    double[] Studentized,
    double[] StudentizedExternal,
    double[] Leverage,
    double[] CooksDistance);
