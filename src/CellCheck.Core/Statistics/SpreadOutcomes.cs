namespace CellCheck.Core.Statistics;

/// <summary>The outcomes of the spread tests asked of <see cref="SpreadKernel"/> (null: not asked).</summary>
internal sealed record SpreadOutcomes(
    TestOutcome? Levene,
    TestOutcome? BrownForsythe,
    TestOutcome? BrownForsytheZerosRemoved,
    TestOutcome? Bartlett,
    TestOutcome? FlignerKilleen);
