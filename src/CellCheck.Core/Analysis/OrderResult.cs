namespace CellCheck.Core.Analysis;

/// <summary>
/// Independence in run order: the run-order column, Durbin-Watson (exact p for the fitted design, or the normal
/// approximation with the design's exact mean and variance of d), the runs test on residual signs, the linear trend of
/// residuals on run order, lag-1 autocorrelation, the same within each block, and notes (ties, missing positions).
/// Null <see cref="Column"/> means no run order was declared and independence was not checked.
/// </summary>
public sealed record OrderResult(
    string? Column,
    int Rows,
    IReadOnlyList<CheckResult> Checks,
    double? Lag1,
    double? ExpectedD,
    string? Method,
    IReadOnlyList<BlockOrderResult> ByBlock,
    IReadOnlyList<string> Notes)
{
    /// <summary>Durbin-Watson p against autocorrelation of either sign: 2·min(p, 1 − p) of the one-sided p (the
    /// distribution of d is continuous).</summary>
    public double? DurbinWatsonTwoSided => Checks.FirstOrDefault(c => c.Check == CheckNames.DurbinWatson)?.P is { } p ? Math.Min(1, 2 * Math.Min(p, 1 - p)) : null;

    public static OrderResult NotDeclared { get; } = new(null, 0, [], null, null, null, [],
        ["No run order was declared, so independence was not checked. Add run_order: COLUMN (or run_order: file when the rows are in run order)."]);
}
