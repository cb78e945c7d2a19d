namespace CellCheck.Core.Analysis;

/// <summary>
/// One check as reported: the statistic, degrees of freedom (when the reference distribution has them), p, the
/// multiplicity-adjusted p (within-cell checks), the status and, for a check that could not run, the reason code.
/// </summary>
public sealed record CheckResult(
    string Check,
    double? Statistic,
    IReadOnlyList<double>? Df,
    double? P,
    double? PAdjusted,
    CheckStatus Status,
    string? Reason);
