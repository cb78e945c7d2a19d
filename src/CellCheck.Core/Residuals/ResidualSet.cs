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
/// <remarks>Fitted values and studentized residuals may be given as ways to compute them: they are formed on first
/// use, so a large check that writes no per-row output never holds them.</remarks>
public sealed record ResidualSet
{
    private readonly OnDemandColumn fitted;
    private readonly OnDemandColumn studentized;

    public ResidualSet(string model, double[] residuals, double[] fitted, double[] studentized, double residualSd, int residualDf,
        INullPlan nullPlan, bool withinCellShift = false)
        : this(model, residuals, new OnDemandColumn(fitted), new OnDemandColumn(studentized), residualSd, residualDf, nullPlan, withinCellShift)
    {
    }

    public ResidualSet(string model, double[] residuals, Func<double[]> fitted, Func<double[]> studentized, double residualSd, int residualDf,
        INullPlan nullPlan, bool withinCellShift = false)
        : this(model, residuals, new OnDemandColumn(fitted), new OnDemandColumn(studentized), residualSd, residualDf, nullPlan, withinCellShift)
    {
    }

    private ResidualSet(string model, double[] residuals, OnDemandColumn fitted, OnDemandColumn studentized, double residualSd, int residualDf,
        INullPlan nullPlan, bool withinCellShift)
    {
        Model = model;
        Residuals = residuals;
        this.fitted = fitted;
        this.studentized = studentized;
        ResidualSd = residualSd;
        ResidualDf = residualDf;
        NullPlan = nullPlan;
        WithinCellShift = withinCellShift;
    }

    public string Model { get; }

    public double[] Residuals { get; }

    public double[] Fitted => fitted.Value;

    public double[] Studentized => studentized.Value;

    public double ResidualSd { get; }

    public int ResidualDf { get; }

    public INullPlan NullPlan { get; }

    public bool WithinCellShift { get; }

    /// <summary>The studentized residuals for one reading: those kept if already formed (<paramref name="owned"/>
    /// false: do not write to them), else a fresh array that is not kept and the caller may overwrite.</summary>
    internal double[] StudentizedOnce(out bool owned) => studentized.Once(out owned);

    /// <summary>Leverage, external studentized residuals, Cook's distance and the model description.</summary>
    public ResidualDiagnostics? Diagnostics { get; init; }
}
