namespace CellCheck.Core.Resolution;

/// <summary>
/// How finely a response was recorded: the recording step (the largest increment every value is a whole multiple of,
/// null when unknown), the share of values tied with another in the same cell, the step relative to the residual SD,
/// and whether rounding is coarse enough to mislead the normality tests.
/// </summary>
public sealed record ResolutionSummary(double? Step, double TiedShare, double? StepToSd, bool Coarse)
{
    /// <summary>Coarse when the step is at least this share of the residual SD (common practice, no source).</summary>
    public const double CoarseStepToSd = 0.2;

    /// <summary>Coarse when at least this share of values tie within their cell (common practice, no source).</summary>
    public const double CoarseTiedShare = 0.25;
}
