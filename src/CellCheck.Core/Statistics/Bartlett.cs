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
    public static TestOutcome Test(GroupedValues groups)
    {
        ArgumentNullException.ThrowIfNull(groups);
        groups = SampleGuard.Scaled(groups);
        if (GroupFilter.CountAtLeast(groups, 2) < 2)
        {
            return TestOutcome.NotTestable(NotTestableReason.TooFewGroups);
        }

        var variances = new double[groups.GroupCount];
        var k = 0;
        var nu = 0;
        var pooledSs = 0.0;
        var reciprocalSum = 0.0;
        for (var g = 0; g < groups.GroupCount; g++)
        {
            var y = groups.Group(g);
            if (y.Length < 2)
            {
                continue;
            }

            var ss = Descriptive.SumOfSquares(y);
            if (!(ss > 0))
            {
                return TestOutcome.NotTestable(NotTestableReason.ZeroVarianceGroup);
            }

            variances[g] = ss / (y.Length - 1);
            pooledSs += ss;
            reciprocalSum += 1.0 / (y.Length - 1);
            nu += y.Length - 1;
            k++;
        }

        var pooled = pooledSs / nu;
        var numerator = 0.0;
        for (var g = 0; g < groups.GroupCount; g++)
        {
            if (groups.Size(g) >= 2)
            {
                numerator += (groups.Size(g) - 1) * Math.Log(pooled / variances[g]);
            }
        }

        var correction = 1.0 + ((reciprocalSum - (1.0 / nu)) / (3.0 * (k - 1)));
        var statistic = Math.Max(0.0, numerator / correction);
        return new TestOutcome(statistic, UpperTail.ChiSquare(statistic, k - 1), k - 1);
    }
}
