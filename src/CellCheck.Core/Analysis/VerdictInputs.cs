using CellCheck.Core.Calibration;
using CellCheck.Core.Cells;
using CellCheck.Core.Data;

namespace CellCheck.Core.Analysis;

/// <summary>Everything the verdict of one response is written from.</summary>
internal sealed record VerdictInputs(
    Census Census,
    IReadOnlyList<CellResult> Cells,
    PooledResult Pooled,
    SpreadResult Spread,
    IReadOnlyList<FactorColumn> Factors,
    IReadOnlyList<AssumptionVerdict> Assumptions,
    OperatingCharacteristics? Operating,
    ModelResult Model)
{
    public Resolution.ResolutionSummary? Resolution { get; init; }
}
