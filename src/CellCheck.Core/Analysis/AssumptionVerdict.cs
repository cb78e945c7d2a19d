namespace CellCheck.Core.Analysis;

/// <summary>
/// The decision on one assumption: its primary check, the check's statistic and p-value (by simulation for this
/// design, or asymptotic), the p-value after Holm's adjustment across the assumptions judged, the status, and the rule
/// that chose the primary check (in words, with its reason).
/// </summary>
public sealed record AssumptionVerdict(
    string Assumption,
    string? Check,
    double? Statistic,
    double? P,
    double? PAdjusted,
    CheckStatus Status,
    string? Reason,
    string Rule,
    string PMethod);
