namespace CellCheck.Core.Residuals;

/// <summary>
/// Residuals of a fitted model in the grouped (cell) order of a <see cref="Cells.CellPartition"/>, with fitted
/// values (relative to the response origin), internally studentized residuals (NaN where leverage is 1, e.g. a
/// singleton cell), the pooled residual standard deviation and its degrees of freedom.
/// </summary>
public sealed record ResidualSet(string Model, double[] Residuals, double[] Fitted, double[] Studentized, double ResidualSd, int ResidualDf);
