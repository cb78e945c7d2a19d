using CellCheck.Core.Calibration;
using CellCheck.Core.Cells;
using CellCheck.Core.Data;
using CellCheck.Core.Models;

namespace CellCheck.Core.Residuals;

/// <summary>
/// Residuals of a declared linear model (terms among the factors, additive blocks, numeric factors as linear terms),
/// fitted by least squares with a pivoted QR (<see cref="LinearFit"/>). Aliased columns are decided in term order
/// (<see cref="OrderedRank"/>), reported, and the estimable part is fitted. Rows are taken in the partition's grouped order, so residuals group by cell.
/// </summary>
public sealed class ModelResiduals(IReadOnlyList<FactorColumn> blocks, ModelSpec spec, string name) : IResidualSource
{
    public string Name => name;

    public ResidualSet Compute(CellPartition partition)
    {
        ArgumentNullException.ThrowIfNull(partition);
        if (partition.RowOrder.Length == 0)
        {
            // No usable value of this response (all missing or excluded): there is nothing to fit, and the cell-means
            // residuals of no rows make every check not-testable.
            return new CellMeansResiduals().Compute(partition);
        }

        var design = DesignMatrixBuilder.Build(partition.Factors, blocks, spec, partition.RowOrder);
        var y = partition.Values.Values;
        var kept = OrderedRank.KeptColumns(design.X);
        var aliased = Enumerable.Range(0, design.ColumnCount).Except(kept).ToArray();
        var estimable = MatrixColumns.Select(design.X, kept);
        var fit = LinearFit.Fit(estimable, y);
        var aliasedColumns = aliased.Select(c => design.Columns[c]).ToArray();
        var aliasedTerms = aliased.Select(c => design.ColumnTerm[c]).Where(t => t >= 0).Distinct().Select(t => design.Terms[t]).ToArray();
        var info = new ModelInfo(name, design.Terms, fit.Rank, design.ColumnCount, fit.ResidualDf, aliasedColumns, aliasedTerms);
        estimable = LinearFit.EstimableDesign(estimable, fit);
        var plan = new ModelPlan(estimable, partition.Values.Starts, PlanKey.Of(estimable, partition.Values.Starts));
        return new ResidualSet(name, fit.Residuals, fit.Fitted, fit.StudentizedInternal, fit.ResidualSd, fit.ResidualDf, plan)
        {
            Diagnostics = new ResidualDiagnostics(fit.Leverage, fit.StudentizedExternal, fit.CooksDistance, info) { Design = design, Fit = fit, Estimable = estimable },
        };
    }
}
