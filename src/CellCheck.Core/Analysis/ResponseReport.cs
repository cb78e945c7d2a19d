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
    Verdict Verdict);
