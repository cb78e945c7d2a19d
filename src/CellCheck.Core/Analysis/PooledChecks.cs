using CellCheck.Core.Calibration;
using CellCheck.Core.Residuals;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Analysis;

/// <summary>
/// Normality of the pooled internally studentized residuals (singleton cells, whose residuals are structurally
/// zero, are left out): Shapiro-Wilk, Anderson-Darling and D'Agostino-Pearson K², with skewness and kurtosis.
/// </summary>
internal static class PooledChecks
{
    public static PooledResult Run(ResidualSet residuals, double alpha)
    {
        // the finite values, packed to the front of a fresh array of the studentized residuals (or of a copy, when
        // they are kept for per-row output), then sorted there
        var source = residuals.StudentizedOnce(out var owned);
        var values = owned ? source : new double[Finite(source)];
        var k = 0;
        foreach (var r in source)
        {
            if (double.IsFinite(r))
            {
                values[k++] = r;
            }
        }

        var notes = new List<string>();
        var span = values.AsSpan(0, k);
        if (residuals.ResidualDf <= 0 || span.Length == 0)
        {
            notes.Add("No residual degrees of freedom: every cell holds a single value, so residuals cannot be judged.");
            var reason = NotTestableReason.NoResidualDegreesOfFreedom;
            return new PooledResult(residuals.Model, 0, residuals.ResidualDf, residuals.ResidualSd, double.NaN, double.NaN,
                [CheckResults.NotTestable(CheckNames.ShapiroWilk, reason), CheckResults.NotTestable(CheckNames.AndersonDarling, reason),
                 CheckResults.NotTestable(CheckNames.DagostinoPearson, reason)], notes);
        }

        if (span.Length > PrimaryRules.ShapiroWilkLimit)
        {
            notes.Add($"Shapiro-Wilk's p approximation holds up to {PrimaryRules.ShapiroWilkLimit} values; with {span.Length} the W statistic is shown without p. "
                + "Judge by Anderson-Darling, D'Agostino-Pearson and the size of skewness and kurtosis.");
        }

        RadixSort.Sort(values, span.Length); // once for all three tests (each would sort its own copy)
        // the moments, Shapiro-Wilk and D'Agostino-Pearson only read the sorted values: side by side on a long sample
        MomentSummary moments = null!;
        TestOutcome shapiroWilk = null!, dagostino = null!;
        Action[] readers =
        [
            () => moments = Moments.Summarize(values.AsSpan(0, k)),
            () => shapiroWilk = ShapiroWilk.TestSorted(values.AsSpan(0, k)),
            () => dagostino = DagostinoPearson.Test(values.AsSpan(0, k)),
        ];
        if (k >= RadixSort.Threshold)
        {
            Parallel.Invoke(readers);
        }
        else
        {
            Array.ForEach(readers, read => read());
        }

        CheckResult[] checks =
        [
            CheckResults.From(CheckNames.ShapiroWilk, shapiroWilk, alpha),
            CheckResults.From(CheckNames.AndersonDarling, AndersonDarling.TestSortedInPlace(values, span.Length), alpha), // last: it overwrites the copy
            CheckResults.From(CheckNames.DagostinoPearson, dagostino, alpha),
        ];
        return new PooledResult(residuals.Model, span.Length, residuals.ResidualDf, residuals.ResidualSd, moments.Skewness, moments.ExcessKurtosis, checks, notes);
    }

    private static int Finite(double[] values)
    {
        var finite = 0;
        foreach (var r in values)
        {
            finite += double.IsFinite(r) ? 1 : 0;
        }

        return finite;
    }
}
