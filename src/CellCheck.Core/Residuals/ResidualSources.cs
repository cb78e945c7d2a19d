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
        var cellMeans = data.Blocks.Count == 0 && spec.IsFull(data.Factors.Count) && data.Factors.All(f => !f.IsNumeric);
        return cellMeans ? new CellMeansResiduals() : new ModelResiduals(data.Blocks, spec, modelName);
    }
}
