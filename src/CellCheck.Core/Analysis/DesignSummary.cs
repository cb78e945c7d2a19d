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

    /// <summary>The family of the within-cell adjustment: "cells" or "cells-and-responses".</summary>
    public string AdjustAcross { get; init; } = "cells";

    /// <summary>Rows left out by the design's row filter.</summary>
    public int FilteredOut { get; init; }
}
