using CellCheck.Core.Models;

namespace CellCheck.Core.Residuals;

/// <summary>
/// Case diagnostics of a fit in the partition's grouped order: leverage (hat values), externally studentized
/// residuals and Cook's distance (NaN where leverage is one), with the model description, and, for a general
/// linear model, its design matrix and fit.
/// </summary>
/// <remarks>Leverages, externally studentized residuals and Cook's distances may be given as ways to compute them: they are then
/// formed on first use (only per-row output keeps them), so a large check that writes none never holds them.</remarks>
public sealed record ResidualDiagnostics
{
    private readonly OnDemandColumn leverage;
    private readonly OnDemandColumn studentizedExternal;
    private readonly OnDemandColumn cooksDistance;

    public ResidualDiagnostics(double[] leverage, double[] studentizedExternal, double[] cooksDistance, ModelInfo model)
        : this(new OnDemandColumn(leverage), new OnDemandColumn(studentizedExternal), new OnDemandColumn(cooksDistance), model)
    {
    }

    public ResidualDiagnostics(Func<double[]> leverage, Func<double[]> studentizedExternal, Func<double[]> cooksDistance, ModelInfo model)
        : this(new OnDemandColumn(leverage), new OnDemandColumn(studentizedExternal), new OnDemandColumn(cooksDistance), model)
    {
    }

    private ResidualDiagnostics(OnDemandColumn leverage, OnDemandColumn studentizedExternal, OnDemandColumn cooksDistance, ModelInfo model)
    {
        this.leverage = leverage;
        this.studentizedExternal = studentizedExternal;
        this.cooksDistance = cooksDistance;
        Model = model;
    }

    /// <summary>Leverage (hat value) of each row.</summary>
    public double[] Leverage => leverage.Value;

    /// <summary>Rows whose leverage is not below 1 − 10⁻¹⁰ and rows whose leverage is at least that (the same rows
    /// unless a leverage is NaN): given by a fit that does not hold its leverages, else counted from them.</summary>
    internal (int NotBelowOne, int AtLeastOne) LeverageOneRows
    {
        get => leverageOneRows ??= Count(Leverage);
        init => leverageOneRows = value;
    }

    private (int NotBelowOne, int AtLeastOne)? leverageOneRows;

    private static (int, int) Count(double[] leverage)
    {
        var (notBelowOne, atLeastOne) = (0, 0);
        foreach (var h in leverage)
        {
            notBelowOne += h < 1 - 1e-10 ? 0 : 1;
            atLeastOne += h >= 1 - 1e-10 ? 1 : 0;
        }

        return (notBelowOne, atLeastOne);
    }

    /// <summary>Externally studentized residual of each row (NaN where leverage is one).</summary>
    public double[] StudentizedExternal => studentizedExternal.Value;

    /// <summary>Cook's distance of each row (NaN where leverage is one).</summary>
    public double[] CooksDistance => cooksDistance.Value;

    public ModelInfo Model { get; }

    /// <summary>The design matrix (null for the cell-means fast path).</summary>
    public DesignMatrix? Design { get; init; }

    /// <summary>The least-squares fit on the estimable columns (null for the cell-means fast path).</summary>
    public LinearFitResult? Fit { get; init; }

    /// <summary>The absorbed fit of cells plus additive blocks, when that is how the model was fitted (null otherwise).</summary>
    internal CellBlockFit? Absorbed { get; init; }

    /// <summary>The full-rank design matrix actually fitted: the estimable columns in order (null for cell means).</summary>
    public double[,]? Estimable { get; init; }

    /// <summary>The externally studentized residuals for one reading: those kept if already formed, else a fresh
    /// copy that is not kept (the outlier screen reads them once; per-row output keeps them).</summary>
    internal double[] StudentizedExternalOnce() => studentizedExternal.Once(out _);

    /// <summary>The fit's own outlier screen over values formed range by range (the absorbed fit), or null.</summary>
    internal CellBlockCases? Cases { get; init; }

    /// <summary>The outlier screen of the externally studentized residuals: from the column when it is kept (per-row
    /// output) or there is no range-by-range screen, else without forming the column.</summary>
    internal IReadOnlyList<(int Row, double T, double PAdjusted)> ScreenOutliers(int residualDf, out int screened) =>
        Cases is { } cases && !studentizedExternal.IsKept
            ? cases.ScreenExternal(residualDf, LeverageOneRows.NotBelowOne, out screened)
            : OutlierScreen.Screen(StudentizedExternalOnce(), residualDf, out screened);
}
