namespace CellCheck.Core.Analysis;

/// <summary>What was checked: design and data files (as given), factors, run-order column, alpha and adjustment.</summary>
public sealed record DesignSummary(
    string DesignFile,
    string DataFile,
    string? Name,
    IReadOnlyList<string> Factors,
    string? RunOrder,
    double Alpha,
    string Adjust);
