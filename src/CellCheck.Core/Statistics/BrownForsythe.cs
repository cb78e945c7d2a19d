namespace CellCheck.Core.Statistics;

/// <summary>
/// The Brown-Forsythe test for equal variances (Brown &amp; Forsythe 1974, "Robust tests for the equality of
/// variances", JASA 69, 364-367): Levene's one-way ANOVA F computed on z = |y − median_g|, the absolute deviations
/// from the group medians, referred to F(k − 1, N − k), an approximation as for Levene's test. Centring on the median makes the test robust to skewed data.
/// </summary>
/// <remarks>
/// Only groups with at least two values take part; k and N count those groups and their values. Not testable when
/// fewer than two groups take part (<see cref="NotTestableReason.TooFewGroups"/>), when every participating group has
/// two values (both deviations from the median of a pair are equal: <see cref="NotTestableReason.AllGroupsOfTwo"/>),
/// or when the deviations otherwise vary within groups by no more than rounding error
/// (<see cref="NotTestableReason.DegenerateWithinGroups"/>). The p-value is the F upper tail, evaluated as the
/// regularized incomplete beta function (Abramowitz &amp; Stegun 26.6.2) without subtracting from one in the far tail.
/// </remarks>
public static class BrownForsythe
{
    /// <summary>Tests whether the groups share one variance, using deviations from the group medians.</summary>
    /// <returns>F with Df1 = k − 1 and Df2 = N − k, and its upper-tail p-value.</returns>
    public static TestOutcome Test(GroupedValues groups) => SpreadKernel.Run(groups, SpreadTests.BrownForsythe).BrownForsythe!;
}
