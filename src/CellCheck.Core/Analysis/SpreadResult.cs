namespace CellCheck.Core.Analysis;

/// <summary>
/// Tests of equal spread across the cells with at least two values, and the ratio of the largest to the smallest
/// cell SD (with the cells that have them, by index into the response's cell list).
/// </summary>
public sealed record SpreadResult(
    int CellsUsed,
    IReadOnlyList<CheckResult> Checks,
    double? SdRatio,
    int? LargestSdCell,
    int? SmallestSdCell,
    IReadOnlyList<string> Notes)
{
    public CheckStatus Status => StatusRules.Combine(Checks);
}
