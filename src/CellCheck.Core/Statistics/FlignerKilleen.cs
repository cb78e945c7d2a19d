namespace CellCheck.Core.Statistics;

/// <summary>
/// The Fligner-Killeen test for equal spread (Fligner &amp; Killeen 1976, "Distribution-free two-sample tests for
/// scale", JASA 71, 210-213), in the k-sample, median-centred form that Conover, Johnson &amp; Johnson (1981,
/// "A comparative study of tests for homogeneity of variances", Technometrics 23, 351-361) found robust and powerful.
/// Each value's absolute deviation from its group median is ranked over all N values (mid-ranks for ties) and scored
/// a_i = Φ⁻¹((1 + r_i / (N + 1)) / 2); then X² = Σ n_g (ā_g − ā)² / s²_a with s²_a the variance (divisor N − 1) of all
/// scores, referred to the chi-square distribution with k − 1 degrees of freedom (a large-sample approximation).
/// </summary>
/// <remarks>
/// Only groups with at least two values take part, and N, k and the ranks count those values only. This departs from
/// implementations that keep groups of one value: such a value has a deviation of exactly zero from its own median,
/// which takes the lowest score whatever the spread of the data, and so only adds noise. On data where every group
/// has two or more values the two agree. Not testable when fewer than two groups take part
/// (<see cref="NotTestableReason.TooFewGroups"/>) or when all scores are equal, so s²_a is zero
/// (<see cref="NotTestableReason.DegenerateWithinGroups"/>). Φ⁻¹ is evaluated once per distinct mid-rank (MathNet's inverse complementary error function).
/// <para>Ties. Deviations that are equal in exact arithmetic (decimal data such as 0.998 and 1.002 about a median
/// of 1.000) often differ in binary by a few units in the last place, and an exact-equality rank then breaks the tie
/// by rounding noise; R's fligner.test and scipy's stats.fligner do so, and their X² shifts with the noise (GEAR:
/// 11.1508 against 11.1465 with the ties kept). Deviations closer than <see cref="TieUlps"/> units in the last
/// place of the largest absolute value are therefore ranked as ties, far below any real measurement resolution.</para>
/// </remarks>
public static class FlignerKilleen
{
    /// <summary>Deviations within this many units in the last place of the data's largest magnitude are tied.</summary>
    public const double TieUlps = 64;

    /// <summary>Tests whether the groups share one spread, using normal scores of ranked absolute deviations.</summary>
    /// <returns>X² with Df1 = k − 1, and its upper-tail chi-square p-value.</returns>
    public static TestOutcome Test(GroupedValues groups) => SpreadKernel.Run(groups, SpreadTests.FlignerKilleen).FlignerKilleen!;
}
