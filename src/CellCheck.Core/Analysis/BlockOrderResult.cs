namespace CellCheck.Core.Analysis;

/// <summary>Run-order checks within one block: rows, Durbin-Watson d (no p: the block's residuals come from the whole
/// fit), lag-1 autocorrelation, runs test and trend.</summary>
public sealed record BlockOrderResult(string Block, int Rows, double? D, double? Lag1, IReadOnlyList<CheckResult> Checks);
