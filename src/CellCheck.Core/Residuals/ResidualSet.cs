using CellCheck.Core.Calibration;

namespace CellCheck.Core.Residuals;

/// <summary>
/// Residuals of a fitted model in the grouped (cell) order of a <see cref="Cells.CellPartition"/>, with fitted
/// values (relative to the response origin), internally studentized residuals (NaN where leverage is 1, e.g. a
/// singleton cell), the pooled residual standard deviation and its degrees of freedom.
/// <see cref="WithinCellShift"/> is true when every residual is its value minus one constant per cell (the
/// cell-means model): then checks that are invariant to a shift within each cell run on the values themselves,
/// so exact ties in the data stay exact (rank-based tests depend on them). <see cref="NullPlan"/> tells the
/// calibration how to simulate this model's residuals under the null.
/// </summary>
public sealed record ResidualSet(string Model, double[] Residuals, double[] Fitted, double[] Studentized, double ResidualSd, int ResidualDf,
    INullPlan NullPlan, bool WithinCellShift = false)
{
    /// <summary>Leverage, external studentized residuals, Cook's distance and the model description.</summary>
    public ResidualDiagnostics? Diagnostics { get; init; }
}
