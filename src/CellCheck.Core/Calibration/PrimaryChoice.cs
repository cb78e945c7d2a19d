namespace CellCheck.Core.Calibration;

/// <summary>The primary test for each assumption, with the reason it was chosen for this design's cell sizes.</summary>
public sealed record PrimaryChoice(NormalityPrimary Normality, string NormalityReason, SpreadPrimary Spread, string SpreadReason);
