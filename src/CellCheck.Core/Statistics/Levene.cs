namespace CellCheck.Core.Statistics;

/// <summary>
/// Levene's test for equal variances (Levene 1960, "Robust tests for equality of variances", in Olkin (ed.),
/// Contributions to Probability and Statistics, Stanford University Press, 278-292): the one-way ANOVA F statistic
/// computed on z = |y − ȳ_g|, the absolute deviations from the group means, referred to F(k − 1, N − k). The F reference distribution is an approximation: the deviations are
/// neither normal nor independent within a group, and the test is valid only asymptotically.
/// </summary>
/// <remarks>
/// Only groups with at least two values take part; k and N count those groups and their values. A group of one
/// value has a deviation of exactly zero that says nothing about spread. Not testable when fewer than two groups take
/// part (<see cref="NotTestableReason.TooFewGroups"/>), when every participating group has two values (the two
/// deviations of a pair are equal, so there is no within-group variation: <see cref="NotTestableReason.AllGroupsOfTwo"/>),
/// or when the deviations otherwise vary within groups by no more than rounding error
/// (<see cref="NotTestableReason.DegenerateWithinGroups"/>). The p-value is the F upper tail, evaluated as the
/// regularized incomplete beta function (Abramowitz &amp; Stegun 26.6.2) without subtracting from one in the far tail.
/// </remarks>
public static class Levene
{
    /// <summary>Tests whether the groups share one variance, using deviations from the group means.</summary>
    /// <returns>F with Df1 = k − 1 and Df2 = N − k, and its upper-tail p-value.</returns>
    public static TestOutcome Test(GroupedValues groups) => SpreadKernel.Run(groups, SpreadTests.Levene).Levene!;
}
