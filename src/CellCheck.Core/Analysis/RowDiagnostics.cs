namespace CellCheck.Core.Analysis;

/// <summary>Per-row diagnostics in cell order: data-file line, cell index, fitted value, residual, internally and
/// externally studentized residuals, leverage and Cook's distance (NaN where leverage is one), and the run position
/// (null when no run order was declared; NaN where missing).</summary>
/// <remarks>The columns that are copies of the data in cell order (lines, cells, fitted values on the response scale,
/// run positions, block codes) and the case values (studentized residuals, leverages, Cook's distances) are built on
/// first use, so a run that writes no per-row output (JSON report only) holds no per-row copy of them: at ten million
/// rows that is several hundred megabytes.</remarks>
public sealed class RowDiagnostics
{
    private readonly Lazy<int[]> lines;
    private readonly Lazy<int[]> cells;
    private readonly Lazy<double[]> fitted;
    private readonly Lazy<double[]> studentized;
    private readonly Lazy<double[]> studentizedExternal;
    private readonly Lazy<double[]> leverage;
    private readonly Lazy<double[]> cooksDistance;
    private readonly Lazy<double[]?> runOrder;
    private readonly Lazy<IReadOnlyList<int[]>> blockCodes;

    public RowDiagnostics(Func<int[]> lines, Func<int[]> cells, Func<double[]> fitted, double[] residuals, Func<double[]> studentized,
        Func<double[]> studentizedExternal, Func<double[]> leverage, Func<double[]> cooksDistance, Func<double[]?> runOrder, Func<IReadOnlyList<int[]>> blockCodes)
    {
        this.lines = new Lazy<int[]>(lines);
        this.cells = new Lazy<int[]>(cells);
        this.fitted = new Lazy<double[]>(fitted);
        this.runOrder = new Lazy<double[]?>(runOrder);
        this.blockCodes = new Lazy<IReadOnlyList<int[]>>(blockCodes);
        Residuals = residuals;
        this.studentized = new Lazy<double[]>(studentized);
        this.studentizedExternal = new Lazy<double[]>(studentizedExternal);
        this.leverage = new Lazy<double[]>(leverage);
        this.cooksDistance = new Lazy<double[]>(cooksDistance);
    }

    public int[] Lines => lines.Value;

    public int[] Cells => cells.Value;

    public double[] Fitted => fitted.Value;

    public double[] Residuals { get; }

    public double[] Studentized => studentized.Value;

    public double[] StudentizedExternal => studentizedExternal.Value;

    public double[] Leverage => leverage.Value;

    public double[] CooksDistance => cooksDistance.Value;

    public double[]? RunOrder => runOrder.Value;

    /// <summary>Block level index of each row per block factor (empty without blocks).</summary>
    public IReadOnlyList<int[]> BlockCodes => blockCodes.Value;

    /// <summary>Level labels of each block factor, indexed by the codes in <see cref="BlockCodes"/> (empty without blocks).</summary>
    public IReadOnlyList<IReadOnlyList<string>> BlockLevels { get; init; } = [];
}
