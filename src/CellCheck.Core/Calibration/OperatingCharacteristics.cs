namespace CellCheck.Core.Calibration;

/// <summary>
/// How the verdict behaves for this design's cell sizes, by simulation: how often clean data are flagged (false
/// alarm), and how often a 4:1 variance ratio in one cell or a lognormal cell is flagged (power).
/// </summary>
public sealed record OperatingCharacteristics(double Alpha, RateEstimate FalseAlarm, RateEstimate VarianceRatio4, RateEstimate Lognormal);
