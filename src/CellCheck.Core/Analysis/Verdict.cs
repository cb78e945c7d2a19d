using CellCheck.Core.Calibration;

namespace CellCheck.Core.Analysis;

/// <summary>
/// The overall status of one response, decided by the primary check of each assumption (Holm across the
/// assumptions judged, so clean data are flagged at most alpha of the time), the per-assumption decisions, the
/// verdict's simulated operating characteristics for this design, and findings in plain language.
/// </summary>
public sealed record Verdict(
    CheckStatus Status,
    IReadOnlyList<string> Findings,
    IReadOnlyList<AssumptionVerdict> Assumptions,
    OperatingCharacteristics? Operating)
{
    /// <summary>How the family-wise false-alarm rate is controlled.</summary>
    public const string Family = "holm";
}
