namespace CellCheck.Core.Statistics;

/// <summary>
/// Bartlett's test for equal variances (Bartlett 1937, "Properties of sufficiency and statistical tests",
/// Proc. R. Soc. Lond. A 160, 268-282): with ν_g = n_g − 1, ν = Σ ν_g = N − k, group variances s²_g and pooled
/// variance s²_p = Σ ν_g s²_g / ν,
/// K² = [ν ln s²_p − Σ ν_g ln s²_g] / C,  C = 1 + (Σ 1/ν_g − 1/ν) / (3(k − 1)),
/// referred to the chi-square distribution with k − 1 degrees of freedom (a large-sample approximation; the
/// correction factor C brings its mean close to k − 1 for small groups). Sensitive to non-normality.
/// </summary>
/// <remarks>
/// Only groups with at least two values take part. The numerator is accumulated as Σ ν_g ln(s²_p / s²_g), which
/// avoids cancellation between two large sums. Not testable when fewer than two groups take part
/// (<see cref="NotTestableReason.TooFewGroups"/>) or when any participating group has zero variance, whose logarithm
/// is minus infinity (<see cref="NotTestableReason.ZeroVarianceGroup"/>); no infinite statistic is ever returned.
/// The p-value is the regularized upper incomplete gamma Q((k − 1)/2, K²/2).
/// </remarks>
public static class Bartlett
{
    /// <summary>Tests whether the groups share one variance under normality.</summary>
    /// <returns>K² (never negative: rounding below zero is clamped) with Df1 = k − 1, and its upper-tail chi-square p-value.</returns>
    public static TestOutcome Test(GroupedValues groups) => SpreadKernel.Run(groups, SpreadTests.Bartlett).Bartlett!;
}
