namespace CellCheck.Core.Analysis;

/// <summary>What was checked: design and data files (as given), factors, run-order column, alpha and adjustment.</summary>
public sealed record DesignSummary(
    string DesignFile,
    string DataFile,
    string? Name,
    IReadOnlyList<string> Factors,
    string? RunOrder,
    double Alpha,
    string Adjust)
{
    /// <summary>Block (nuisance factor) names.</summary>
    public IReadOnlyList<string> Blocks { get; init; } = [];
}
