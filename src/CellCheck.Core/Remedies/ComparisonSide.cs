using CellCheck.Core.Analysis;

namespace CellCheck.Core.Remedies;

/// <summary>One side (before or after) of a compared check: its p, the p after the report's adjustment (verdict
/// rows), and its status.</summary>
public sealed record ComparisonSide(double? P, double? PAdjusted, CheckStatus Status);
