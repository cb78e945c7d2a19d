using CellCheck.Core.Cells;
using CellCheck.Core.Data;

namespace CellCheck.Core.Analysis;

/// <summary>Every result for one response.</summary>
public sealed record ResponseReport(
    string Response,
    string? Unit,
    int RowsUsed,
    IReadOnlyList<ExcludedRow> Excluded,
    Census Census,
    IReadOnlyList<CellResult> Cells,
    PooledResult Pooled,
    SpreadResult Spread,
    Verdict Verdict)
{
    /// <summary>The fitted model and the checks of its form.</summary>
    public required ModelResult Model { get; init; }

    /// <summary>Independence in run order.</summary>
    public required OrderResult Order { get; init; }

    /// <summary>How finely the response was recorded, and whether rounding is coarse enough to matter.</summary>
    public Resolution.ResolutionSummary? Resolution { get; init; }

    /// <summary>Per-row diagnostics in cell order.</summary>
    public required RowDiagnostics Rows { get; init; }

    /// <summary>Transformation advice and, when one was applied, the transformed response's report; null when not computed.</summary>
    public Remedies.RemedyResult? Remedy { get; init; }

    /// <summary>Are there enough replicates: census verdict and the sensitivity of the single checks.</summary>
    public Planning.ReplicatesResult? Replicates { get; init; }

    /// <summary>The cells of this analysis, kept for the remedy step so it need not partition the rows again (not reported).</summary>
    internal Cells.CellPartition? Partition { get; init; }

    /// <summary>The transformation advice's likelihood fits at no shift, when they were run alongside the checks (not reported).</summary>
    internal Remedies.RemedyFits? RemedyFits { get; init; }
}
