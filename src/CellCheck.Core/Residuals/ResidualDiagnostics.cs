using CellCheck.Core.Models;

namespace CellCheck.Core.Residuals;

/// <summary>
/// Case diagnostics of a fit in the partition's grouped order: leverage (hat values), externally studentized
/// residuals and Cook's distance (NaN where leverage is one), with the model description, and, for a general
/// linear model, its design matrix and fit.
/// </summary>
public sealed record ResidualDiagnostics(double[] Leverage, double[] StudentizedExternal, ModelInfo Model)
{
    private readonly Lazy<double[]> cooksDistance = new(() => []);

    public ResidualDiagnostics(double[] leverage, double[] studentizedExternal, double[] cooksDistance, ModelInfo model)
        : this(leverage, studentizedExternal, () => cooksDistance, model)
    {
    }

    /// <summary>Diagnostics whose Cook's distances are computed on first use (only per-row output reads them: a large
    /// check that writes none never holds them).</summary>
    public ResidualDiagnostics(double[] leverage, double[] studentizedExternal, Func<double[]> cooksDistance, ModelInfo model)
        : this(leverage, studentizedExternal, model)
    {
        this.cooksDistance = new Lazy<double[]>(cooksDistance);
    }

    /// <summary>Cook's distance of each row (NaN where leverage is one).</summary>
    public double[] CooksDistance => cooksDistance.Value;

    /// <summary>The design matrix (null for the cell-means fast path).</summary>
    public DesignMatrix? Design { get; init; }

    /// <summary>The least-squares fit on the estimable columns (null for the cell-means fast path).</summary>
    public LinearFitResult? Fit { get; init; }

    /// <summary>The absorbed fit of cells plus additive blocks, when that is how the model was fitted (null otherwise).</summary>
    internal CellBlockFit? Absorbed { get; init; }

    /// <summary>The full-rank design matrix actually fitted: the estimable columns in order (null for cell means).</summary>
    public double[,]? Estimable { get; init; }
}
