namespace CellCheck.Core.Planning;

/// <summary>
/// What a plan is asked for: the smallest effect of interest, the within-cell SD (null: take it from the data), alpha,
/// the target power of the F tests, the rate at which the single checks should see their departures, and the seeded
/// simulation size for the checks.
/// </summary>
public sealed record PlanRequest(SmallestEffect Effect, double? Sd, double Alpha, double Power, double CheckPower, int Draws, int Seed);
