namespace CellCheck.Core.Statistics;

/// <summary>
/// One-way analysis of variance (Fisher 1925, Statistical Methods for Research Workers, ch. VII): the total
/// variation split into the part between group means and the part within groups, F = MS_between / MS_within
/// referred to F(k − 1, N − k).
/// </summary>
/// <remarks>
/// Numerics follow the advice of Simon &amp; Lesage (1989, Comput. Stat. Data Anal. 8, 325-332) for data with many
/// constant leading digits: each group mean is a shifted sum (<see cref="Descriptive.Mean"/>), within-group sums of
/// squares use the corrected two-pass formula of Chan, Golub &amp; LeVeque (1983) with the squares summed by
/// Neumaier's (1974) compensated summation, and the grand mean is formed from
/// the group means about the first group mean, with the same correction applied to the between-group sum of squares.
/// This reproduces the certified values of the NIST StRD one-way ANOVA data sets. Empty groups are ignored and do
/// not count in the degrees of freedom; a group of one value counts in the between-group degrees of freedom.
/// </remarks>
public static class OneWayAnova
{
    /// <summary>Computes the one-way ANOVA table of the grouped values.</summary>
    public static AnovaTable Compute(GroupedValues groups)
    {
        ArgumentNullException.ThrowIfNull(groups);
        var sizes = new int[groups.GroupCount];
        var means = new double[groups.GroupCount];
        var within = new double[groups.GroupCount];
        for (var g = 0; g < groups.GroupCount; g++)
        {
            sizes[g] = groups.Size(g);
            if (sizes[g] > 0)
            {
                (means[g], within[g]) = Summarise(groups.Group(g));
            }
        }

        return FromSummaries(sizes, means, within);
    }

    /// <summary>One group's part of the table: its mean and its within-group sum of squares (non-empty group).</summary>
    internal static (double Mean, double WithinSs) Summarise(ReadOnlySpan<double> y)
    {
        var mean = Descriptive.Mean(y);
        return (mean, CompensatedSumOfSquares(y, mean));
    }

    /// <summary>
    /// The table from each group's size and <see cref="Summarise"/> (empty groups: size 0, the rest ignored), the
    /// groups' parts combined in group order: the same result as <see cref="Compute"/> on the values, bit for bit.
    /// </summary>
    internal static AnovaTable FromSummaries(ReadOnlySpan<int> sizes, ReadOnlySpan<double> means, ReadOnlySpan<double> within)
    {
        var k = 0;
        var n = 0;
        var origin = double.NaN;
        var shiftedTotal = 0.0;
        var ssWithin = 0.0;
        for (var g = 0; g < sizes.Length; g++)
        {
            if (sizes[g] == 0)
            {
                continue;
            }

            var mean = means[g];
            if (k == 0)
            {
                origin = mean;
            }

            shiftedTotal += sizes[g] * (mean - origin);
            ssWithin += within[g];
            k++;
            n += sizes[g];
        }

        var grandMean = n == 0 ? double.NaN : origin + (shiftedTotal / n);
        var ssBetween = BetweenSumOfSquares(sizes, means, grandMean, n);
        return Table(ssBetween, ssWithin, k - 1, n - k);
    }

    private static double BetweenSumOfSquares(ReadOnlySpan<int> sizes, ReadOnlySpan<double> means, double grandMean, int n)
    {
        if (n == 0)
        {
            return double.NaN;
        }

        var ss = 0.0;
        var comp = 0.0;
        for (var g = 0; g < sizes.Length; g++)
        {
            if (sizes[g] == 0)
            {
                continue;
            }

            var d = means[g] - grandMean;
            ss += sizes[g] * d * d;
            comp += sizes[g] * d;
        }

        return Math.Max(0.0, ss - (comp * comp / n));
    }

    /// <summary>
    /// Σ (y − mean)² by the corrected two-pass formula (Chan, Golub &amp; LeVeque 1983), the squares accumulated with
    /// Neumaier's (1974) compensated summation so that large groups (NIST SmLs03, 18 000 values) lose no digits to
    /// the running sum.
    /// </summary>
    internal static double CompensatedSumOfSquares(ReadOnlySpan<double> y, double mean)
    {
        var sum = 0.0;
        var carry = 0.0;
        var deviationSum = 0.0;
        foreach (var v in y)
        {
            var d = v - mean;
            var term = d * d;
            var t = sum + term;
            carry += Math.Abs(sum) >= term ? (sum - t) + term : (term - t) + sum;
            sum = t;
            deviationSum += d;
        }

        return Math.Max(0.0, sum + carry - (deviationSum * deviationSum / y.Length));
    }

    private static AnovaTable Table(double ssBetween, double ssWithin, int dfBetween, int dfWithin)
    {
        dfBetween = Math.Max(dfBetween, 0);
        dfWithin = Math.Max(dfWithin, 0);
        var msBetween = dfBetween > 0 ? ssBetween / dfBetween : double.NaN;
        var msWithin = dfWithin > 0 ? ssWithin / dfWithin : double.NaN;
        var f = FRatio(msBetween, msWithin);
        var total = ssBetween + ssWithin;
        var rSquared = total > 0 ? ssBetween / total : double.NaN;
        return new AnovaTable(
            ssBetween,
            ssWithin,
            dfBetween,
            dfWithin,
            msBetween,
            msWithin,
            f,
            UpperTail.F(f, dfBetween, dfWithin),
            rSquared,
            Math.Sqrt(msWithin));
    }

    private static double FRatio(double msBetween, double msWithin)
    {
        if (double.IsNaN(msBetween) || double.IsNaN(msWithin))
        {
            return double.NaN;
        }

        if (msWithin > 0)
        {
            return msBetween / msWithin;
        }

        return msBetween > 0 ? double.PositiveInfinity : double.NaN;
    }
}
