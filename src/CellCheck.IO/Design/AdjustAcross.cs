namespace CellCheck.IO.Design;

/// <summary>The family over which within-cell p-values are adjusted: the cells of each response, or the cells of all responses together.</summary>
public enum AdjustAcross
{
    Cells,
    CellsAndResponses,
}
