using System.Buffers;
using CellCheck.Core.Cells;
using CellCheck.Core.Residuals;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Analysis;

/// <summary>
/// Within-cell normality: Shapiro-Wilk and Anderson-Darling on each cell's residuals, with each test's p-values
/// adjusted across the testable cells of the response (Holm by default).
/// </summary>
internal static class CellChecks
{
    private const int PoolLimit = 1 << 16;

    public static List<CellResult> Run(CellPartition partition, ResidualSet residuals, double origin, AnalysisOptions options, string response)
    {
        var count = partition.CellCount;
        var sw = new TestOutcome[count];
        var ad = new TestOutcome[count];
        var moments = new MomentSummary[count];
        var starts = partition.Values.Starts;
        // cells are independent: tested in parallel, each result in its own slot, so the outcome does not depend on scheduling
        Parallel.For(0, count, c =>
        {
            var cell = residuals.WithinCellShift ? partition.Values.Group(c) : residuals.Residuals.AsSpan(starts[c], starts[c + 1] - starts[c]);
            (sw[c], ad[c]) = Normality(cell);
            moments[c] = Moments.Summarize(partition.Values.Group(c));
        });

        var swAdjusted = options.JointCells?.Get(response, CheckNames.ShapiroWilk) ?? Adjust(sw, options.Adjust);
        var adAdjusted = options.JointCells?.Get(response, CheckNames.AndersonDarling) ?? Adjust(ad, options.Adjust);
        var results = new List<CellResult>(count);
        for (var c = 0; c < count; c++)
        {
            var m = moments[c];
            CheckResult[] checks =
            [
                CheckResults.From(CheckNames.ShapiroWilk, sw[c], options.Alpha, swAdjusted[c]),
                CheckResults.From(CheckNames.AndersonDarling, ad[c], options.Alpha, adAdjusted[c]),
            ];
            results.Add(new CellResult(partition.Levels(c), m.Count, origin + m.Mean, m.StandardDeviation, m.Skewness, m.ExcessKurtosis, checks));
        }

        return results;
    }

    /// <summary>Shapiro-Wilk and Anderson-Darling from one sorted copy of the cell (each test alone would sort its
    /// own); Anderson-Darling runs last, in the copy.</summary>
    private static (TestOutcome ShapiroWilk, TestOutcome AndersonDarling) Normality(ReadOnlySpan<double> cell)
    {
        // pooled for ordinary cells; a cell of millions of values gets its own copy (a pool would keep it alive)
        var pooled = cell.Length <= PoolLimit;
        var sorted = pooled ? ArrayPool<double>.Shared.Rent(cell.Length) : new double[cell.Length];
        try
        {
            var span = sorted.AsSpan(0, cell.Length);
            cell.CopyTo(span);
            SampleGuard.RequireFinite(span, nameof(cell));
            if (!RadixSort.IsAscending(span))
            {
                RadixSort.Sort(span);
            }

            return (ShapiroWilk.TestSorted(span), AndersonDarling.TestSortedInPlace(span));
        }
        finally
        {
            if (pooled)
            {
                ArrayPool<double>.Shared.Return(sorted);
            }
        }
    }

    private static double?[] Adjust(TestOutcome[] outcomes, AdjustMethod method)
    {
        var p = new double[outcomes.Length];
        for (var i = 0; i < p.Length; i++)
        {
            p[i] = outcomes[i].IsTestable ? outcomes[i].P : double.NaN;
        }

        var adjusted = PValueAdjustment.Adjust(p, method);
        var result = new double?[p.Length];
        for (var i = 0; i < p.Length; i++)
        {
            result[i] = double.IsNaN(adjusted[i]) ? null : adjusted[i];
        }

        return result;
    }
}
