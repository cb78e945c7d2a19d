using CellCheck.Core.Cells;

namespace CellCheck.Core.Residuals;

/// <summary>A model that yields residuals for the cells of a response. Swap the source to change the model.</summary>
public interface IResidualSource
{
    /// <summary>Short stable name of the model, as written in reports (for example "cell-means").</summary>
    string Name { get; }

    /// <summary>Fits the model and returns residuals in the partition's grouped order.</summary>
    ResidualSet Compute(CellPartition partition);
}
