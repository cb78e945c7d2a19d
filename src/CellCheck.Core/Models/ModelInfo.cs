namespace CellCheck.Core.Models;

/// <summary>
/// What was fitted: the model's name, its terms, its rank and number of columns, the residual degrees of freedom,
/// and the columns (and their terms) that are aliased with others and so were not estimated.
/// </summary>
public sealed record ModelInfo(
    string Name,
    IReadOnlyList<string> Terms,
    int Rank,
    int Columns,
    int ResidualDf,
    IReadOnlyList<string> AliasedColumns,
    IReadOnlyList<string> AliasedTerms)
{
    /// <summary>Why this model stands in for the declared one, when it does (null otherwise).</summary>
    public string? Note { get; init; }

    /// <summary>True when the model is cells plus additive blocks fitted by absorbing the cells (<see cref="CellBlockFit"/>).</summary>
    public bool Absorbed { get; init; }
}
