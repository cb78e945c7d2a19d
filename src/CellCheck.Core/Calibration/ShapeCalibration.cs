namespace CellCheck.Core.Calibration;

/// <summary>The primary tests chosen for a design shape, their simulated null distributions (null when the design is
/// above the Monte Carlo limit) and the verdict's operating characteristics (null likewise).</summary>
public sealed record ShapeCalibration(
    DesignShape Shape,
    PrimaryChoice Choice,
    NullDistribution? NormalityNull,
    NullDistribution? SpreadNull,
    OperatingCharacteristics? Operating)
{
    /// <summary>True when the primary p-values come from simulation rather than the asymptotic approximations.</summary>
    public bool MonteCarlo => NormalityNull is not null;
}
