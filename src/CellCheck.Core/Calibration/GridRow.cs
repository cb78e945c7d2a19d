namespace CellCheck.Core.Calibration;

/// <summary>
/// Operating characteristics of the verdict for one grid design, beside the best single test at the same exact size
/// (each candidate test calibrated by its own simulated null distribution).
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
    RateEstimate BestLognormal);
