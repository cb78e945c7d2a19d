namespace CellCheck.Core.Statistics;

/// <summary>
/// Bartlett's statistic corrected for the kurtosis of the errors. Box (1953, "Non-normality and tests on
/// variances", Biometrika 40, 318-335) showed that under errors of excess kurtosis γ₂ Bartlett's K² behaves like
/// (1 + γ₂/2) χ²(k − 1) in large samples; dividing K² by (1 + γ̂₂/2) removes most of its sensitivity to tails while
/// keeping nearly all of its power under normal errors. γ̂₂ is estimated from residuals standardised within each
/// cell, γ̂₂ = (1/N) Σ_g Σ_j (y_gj − ȳ_g)⁴ / m₂,g² − 3 with m₂,g the cell's second moment (divisor n_g), so that
/// unequal spread itself does not inflate it; the divisor is kept at 1/2 or more. The p-value is the chi-square
/// approximation with k − 1 degrees of freedom, which needs cells of about ten or more; CellCheck calibrates it by
/// simulation for the actual design.
/// </summary>
/// <remarks>Groups with at least two values take part; not testable as for <see cref="Bartlett"/>.</remarks>
public static class BartlettKurtosisAdjusted
{
    public static TestOutcome Test(GroupedValues groups)
    {
        ArgumentNullException.ThrowIfNull(groups);
        groups = SampleGuard.Scaled(groups);
        var bartlett = Bartlett.Test(groups);
        if (!bartlett.IsTestable)
        {
            return bartlett;
        }

        var sum = 0.0;
        var count = 0;
        for (var g = 0; g < groups.GroupCount; g++)
        {
            var y = groups.Group(g);
            if (y.Length < 2)
            {
                continue;
            }

            var mean = Descriptive.Mean(y);
            var m2 = Descriptive.SumOfSquares(y, mean) / y.Length;
            foreach (var v in y)
            {
                var z = (v - mean) * (v - mean) / m2;
                sum += z * z;
            }

            count += y.Length;
        }

        var excessKurtosis = (sum / count) - 3.0;
        var divisor = Math.Max(0.5, 1.0 + (excessKurtosis / 2.0));
        var statistic = bartlett.Statistic / divisor;
        return new TestOutcome(statistic, UpperTail.ChiSquare(statistic, bartlett.Df1!.Value), bartlett.Df1);
    }
}
