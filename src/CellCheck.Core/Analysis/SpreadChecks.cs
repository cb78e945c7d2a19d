using CellCheck.Core.Cells;
using CellCheck.Core.Residuals;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Analysis;

/// <summary>
/// Equal spread across cells: Levene (mean-centred), Brown-Forsythe (median-centred), Bartlett and
/// Fligner-Killeen on the residuals of the cells with at least two values, and the largest-to-smallest SD ratio.
/// </summary>
internal static class SpreadChecks
{
    public static SpreadResult Run(CellPartition partition, ResidualSet residuals, IReadOnlyList<CellResult> cells, double alpha)
    {
        // Every spread test is invariant to a shift within each cell; with cell-means residuals use the values
        // themselves so that ties in the data stay exact ties for Fligner-Killeen's ranks.
        var grouped = residuals.WithinCellShift ? partition.Values : new GroupedValues(residuals.Residuals, partition.Values.Starts);
        var used = 0;
        int? largest = null;
        int? smallest = null;
        for (var c = 0; c < cells.Count; c++)
        {
            if (cells[c].N < 2)
            {
                continue;
            }

            used++;
            if (largest is null || cells[c].Sd > cells[largest.Value].Sd)
            {
                largest = c;
            }

            if (smallest is null || cells[c].Sd < cells[smallest.Value].Sd)
            {
                smallest = c;
            }
        }

        var notes = new List<string>();
        var singletons = cells.Count - used;
        if (singletons > 0)
        {
            notes.Add($"{singletons} cell(s) with a single value take no part in the spread tests.");
        }

        // the five tests from one visit of each cell (cells side by side); the caller releases the working copies
        var outcomes = SpreadKernel.Run(grouped, SpreadTests.All);
        CheckResult[] checks =
        [
            CheckResults.From(CheckNames.Levene, outcomes.Levene!, alpha),
            CheckResults.From(CheckNames.BrownForsythe, outcomes.BrownForsythe!, alpha),
            CheckResults.From(CheckNames.BrownForsytheZerosRemoved, outcomes.BrownForsytheZerosRemoved!, alpha),
            CheckResults.From(CheckNames.Bartlett, outcomes.Bartlett!, alpha),
            CheckResults.From(CheckNames.FlignerKilleen, outcomes.FlignerKilleen!, alpha),
        ];
        if (checks[0].Reason == NotTestableReason.AllGroupsOfTwo)
        {
            notes.Add("Every cell has two values: the absolute deviations from the centre are equal within each cell, "
                + "so Levene and Brown-Forsythe are degenerate and are not reported.");
        }

        double? ratio = null;
        if (largest is { } hi && smallest is { } lo && used >= 2)
        {
            if (cells[lo].Sd > 0)
            {
                ratio = cells[hi].Sd / cells[lo].Sd;
            }
            else
            {
                notes.Add("At least one cell has zero spread (all its values equal), so the SD ratio is unbounded.");
            }
        }

        return new SpreadResult(used, checks, ratio, largest, smallest, notes);
    }
}
