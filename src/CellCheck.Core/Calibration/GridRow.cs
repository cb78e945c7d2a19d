namespace CellCheck.Core.Calibration;

/// <summary>
/// Operating characteristics of the verdict for one grid design, beside the best single test at the same exact size
/// (each candidate test calibrated by its own simulated null distribution), how often the verdict's spread decision
/// mistakes heavy tails (t with 5 df in every cell, equal spread) for unequal spread, and every candidate's rates.
/// </summary>
public sealed record GridRow(
    GridDesign Design,
    PrimaryChoice Choice,
    RateEstimate FalseAlarm,
    RateEstimate VarianceRatio4,
    RateEstimate Lognormal,
    string BestVarianceTest,
    RateEstimate BestVariance,
    string BestLognormalTest,
    RateEstimate BestLognormal,
    RateEstimate HeavyTailSpreadFlag,
    IReadOnlyList<RateEstimate> CandidateVariance,
    IReadOnlyList<RateEstimate> CandidateLognormal,
    IReadOnlyList<RateEstimate> CandidateHeavyTails);
