namespace CellCheck.Core.Planning;

/// <summary>
/// The plan for one term: its power with the current replicates, the smallest whole number of replicates per cell that
/// reaches the target power (null when none up to the search limit does, with <see cref="Reason"/>), the real-valued
/// root of power(n) = target, and the power at the answer and one replicate below it (so the answer can be checked).
/// </summary>
public sealed record TermPlan(
    string Term,
    int Df1,
    TermPower? Current,
    int? Needed,
    double? ExactNeeded,
    TermPower? AtNeeded,
    TermPower? BelowNeeded,
    string? Reason);
