namespace CellCheck.Core.Analysis;

/// <summary>One cell of a response: its levels (as in the data file), size, mean, SD, shape and within-cell checks.</summary>
public sealed record CellResult(
    IReadOnlyList<string> Levels,
    int N,
    double Mean,
    double Sd,
    double Skewness,
    double ExcessKurtosis,
    IReadOnlyList<CheckResult> Checks)
{
    /// <summary>Flag when any check flags; not-testable when no check could run; otherwise pass.</summary>
    public CheckStatus Status => StatusRules.Combine(Checks);
}
