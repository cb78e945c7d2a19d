using CellCheck.Core.Data;
using CellCheck.Core.Models;

namespace CellCheck.Core.Residuals;

/// <summary>
/// Chooses how residuals are computed: the full factorial in categorical factors without blocks is the cell-means
/// model, computed directly (exact, and linear in the number of rows); anything else is fitted as a linear model.
/// </summary>
public static class ResidualSources
{
    public static IResidualSource For(DesignData data, ModelSpec spec, string modelName)
    {
        ArgumentNullException.ThrowIfNull(data);
        ArgumentNullException.ThrowIfNull(spec);
        var full = spec.IsFull(data.Factors.Count) && data.Factors.All(f => !f.IsNumeric);
        if (full && data.Blocks.Count == 0)
        {
            return new CellMeansResiduals();
        }

        // the QR fit holds the dense n × p design matrix; beyond DenseLimit values it would not fit in memory
        var rows = (double)data.RowCount;
        var columns = 1.0 + data.Blocks.Sum(b => b.Levels.Count - 1.0) + spec.Terms.Sum(t => t.Factors.Aggregate(1.0, (product, f) => product * Math.Max(1, data.Factors[f].IsNumeric ? 1 : data.Factors[f].Levels.Count - 1)));
        IResidualSource dense = rows * columns <= DenseLimit || !full
            ? new ModelResiduals(data.Blocks, spec, modelName)
            : new CellMeansResiduals("The declared model (" + modelName + ") has about " + Analysis.NumberText.Count((int)Math.Min(int.MaxValue, columns)) + " columns over " + Analysis.NumberText.Count((int)rows) + " rows, too large for the dense least-squares fit, and its blocks cannot be absorbed; "
                + "residuals are taken about the cell means instead, so block differences stay in the residuals and the within-cell spread is overstated by them.");
        return full && rows * columns > AbsorbLimit ? new CellBlockResiduals(data.Blocks, spec, modelName, dense) : dense;
    }

    /// <summary>Above this n·p the full factorial plus blocks is fitted by absorbing the cells (<see cref="CellBlockResiduals"/>)
    /// rather than by dense QR, whose time grows as n·p².</summary>
    public const double AbsorbLimit = 1e6;

    /// <summary>Largest n·p (design matrix values, 8 bytes each) fitted by dense QR: 2·10⁸, 1.6 GB.</summary>
    public const double DenseLimit = 2e8;
}
