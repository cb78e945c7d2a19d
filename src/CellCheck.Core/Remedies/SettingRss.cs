using CellCheck.Core.Cells;
using CellCheck.Core.Data;
using CellCheck.Core.Models;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Remedies;

/// <summary>
/// Residual sum of squares on cells plus additive blocks, organised by identical settings (a cell within a block):
/// within-setting sums of squares plus the weighted fit of the setting means (<see cref="CellBlockFit"/>). The
/// Box-Cox profile uses the same organisation with power sums (<see cref="GroupedPowerSums"/>).
/// </summary>
/// <remarks>The setting order is read a cell at a time (<see cref="SettingOrder"/>), not stored.</remarks>
internal sealed class SettingRss : IResidualSumOfSquares
{
    private SettingRss(SettingOrder order, CellBlockFit between, int residualDf)
    {
        Order = order;
        Between = between;
        ResidualDf = residualDf;
    }

    /// <summary>The grouped positions sorted by setting.</summary>
    public SettingOrder Order { get; }

    /// <summary>Setting g holds positions Starts[g] .. Starts[g + 1] − 1 of the setting order.</summary>
    public int[] Starts => Order.Starts;

    /// <summary>The weighted fit of the model to setting means.</summary>
    public CellBlockFit Between { get; }

    public int Count => Order.Count;

    public int ResidualDf { get; }

    /// <summary>The organisation for a partition, or null when the blocks cannot be absorbed.</summary>
    public static SettingRss? Build(CellPartition partition, IReadOnlyList<FactorColumn> blocks)
    {
        var (settings, count) = SettingGroups.Of(partition, blocks);
        var cellStarts = partition.Values.Starts;
        var starts = new int[count + 1];
        var settingCells = new int[partition.CellCount + 1];
        var weights = new double[count];
        var codes = blocks.Select(_ => new int[count]).ToArray();
        // settings are numbered cell by cell, in order of first appearance: each cell's settings are contiguous and
        // belong to it alone, so ranges of cells count their settings' rows and note each one's block codes (from its
        // first row) side by side, each writing only its own settings
        GroupChunks.ForEach(cellStarts, (from, to) =>
        {
            for (var c = from; c < to; c++)
            {
                for (var i = cellStarts[c]; i < cellStarts[c + 1]; i++)
                {
                    var g = settings[i];
                    if (starts[g + 1]++ == 0)
                    {
                        var row = partition.RowOrder[i];
                        for (var j = 0; j < blocks.Count; j++)
                        {
                            codes[j][g] = blocks[j].Codes[row];
                        }

                        settingCells[c + 1] = g + 1; // the cell's settings end after its last new one
                    }
                }
            }
        });
        for (var c = 0; c < partition.CellCount; c++)
        {
            settingCells[c + 1] = Math.Max(settingCells[c + 1], settingCells[c]); // an empty cell has none
        }

        for (var g = 0; g < count; g++)
        {
            weights[g] = starts[g + 1]; // the setting's row count, before its start is summed in
            starts[g + 1] += starts[g];
        }

        var between = CellBlockFit.Build(settingCells, codes.Select((c, j) => LevelCodes.From(c, blocks[j].Levels.Count)).ToArray(), weights);
        return between is null ? null : new SettingRss(new SettingOrder(settings, partition.Values.Starts, starts), between, settings.Length - between.Rank);
    }

    public double Of(ReadOnlySpan<double> v) => Of(new SpanValues(v));

    /// <summary>The residual sum of squares of y read on demand: the same loops, and value, as for its copy.</summary>
    public double Of(ShiftedValues y) => Of<ShiftedValues>(y);

    private double Of<TValues>(TValues v)
        where TValues : IIndexedValues, allows ref struct
    {
        var total = 0.0;
        var means = new double[Starts.Length - 1];
        var order = new int[Order.LargestCell];
        var next = new int[Order.LargestCell];
        var g = 0;
        for (var c = 0; c < Order.Cells; c++)
        {
            Order.CellOrder(c, order, next);
            var from = Order.CellStarts[c];
            for (; g < means.Length && Starts[g] < Order.CellStarts[c + 1]; g++)
            {
                var sum = 0.0;
                for (var k = Starts[g]; k < Starts[g + 1]; k++)
                {
                    sum += v[order[k - from]];
                }

                means[g] = sum / (Starts[g + 1] - Starts[g]);
                for (var k = Starts[g]; k < Starts[g + 1]; k++)
                {
                    var d = v[order[k - from]] - means[g];
                    total += d * d;
                }
            }
        }

        return PlusBetween(means, total);
    }

    /// <summary><paramref name="within"/> plus the weighted residual sum of squares of the setting means on the model.</summary>
    private double PlusBetween(double[] means, double within)
    {
        var residuals = new double[means.Length];
        Between.Residualize(means, residuals);
        for (var g = 0; g < means.Length; g++)
        {
            within += (Starts[g + 1] - Starts[g]) * residuals[g] * residuals[g];
        }

        return within;
    }
}
