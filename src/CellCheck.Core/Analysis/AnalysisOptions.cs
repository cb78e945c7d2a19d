using CellCheck.Core.Calibration;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Analysis;

/// <summary>
/// Significance level, the multiplicity adjustment of within-cell p-values across the cells of a response, and how
/// much simulation calibrates the primary checks.
/// </summary>
public sealed record AnalysisOptions(double Alpha = 0.05, AdjustMethod Adjust = AdjustMethod.Holm, CalibrationSettings? Calibration = null)
{
    public CalibrationSettings Simulation => Calibration ?? CalibrationSettings.Default;

    /// <summary>Within-cell adjusted p-values computed over all responses together; null: adjust within each response.</summary>
    public JointCellAdjustment? JointCells { get; init; }

    /// <summary>Simulated data sets per scenario for the sensitivity of the single checks (replicates section).</summary>
    public int SensitivityDraws { get; init; } = 400;

    /// <summary>Fit the transformation advice's likelihoods alongside the checks of a large response (the remedy step
    /// then reuses them); off for a re-check of a transformed response, which gives no advice of its own.</summary>
    public bool EarlyRemedy { get; init; } = true;
}
