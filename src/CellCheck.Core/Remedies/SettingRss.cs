using CellCheck.Core.Cells;
using CellCheck.Core.Data;
using CellCheck.Core.Models;

namespace CellCheck.Core.Remedies;

/// <summary>
/// Residual sum of squares on cells plus additive blocks, organised by identical settings (a cell within a block):
/// within-setting sums of squares plus the weighted fit of the setting means (<see cref="CellBlockFit"/>). The
/// Box-Cox profile uses the same organisation with power sums (<see cref="GroupedPowerSums"/>).
/// </summary>
internal sealed class SettingRss : IResidualSumOfSquares
{
    private SettingRss(int[] permutation, int[] starts, CellBlockFit between, int residualDf)
    {
        Permutation = permutation;
        Starts = starts;
        Between = between;
        ResidualDf = residualDf;
    }

    /// <summary>Positions (in the partition's grouped order) sorted by setting.</summary>
    public int[] Permutation { get; }

    /// <summary>Setting g holds Permutation[Starts[g] .. Starts[g + 1] − 1].</summary>
    public int[] Starts { get; }

    /// <summary>The weighted fit of the model to setting means.</summary>
    public CellBlockFit Between { get; }

    public int Count => Permutation.Length;

    public int ResidualDf { get; }

    /// <summary>The organisation for a partition, or null when the blocks cannot be absorbed.</summary>
    public static SettingRss? Build(CellPartition partition, IReadOnlyList<FactorColumn> blocks)
    {
        var (settings, count) = SettingGroups.Of(partition, blocks);
        var starts = new int[count + 1];
        foreach (var g in settings)
        {
            starts[g + 1]++;
        }

        for (var g = 0; g < count; g++)
        {
            starts[g + 1] += starts[g];
        }

        var permutation = new int[settings.Length];
        var next = (int[])starts.Clone();
        for (var i = 0; i < settings.Length; i++)
        {
            permutation[next[settings[i]]++] = i;
        }

        // settings are numbered cell by cell, so each cell's settings are contiguous
        var cellStarts = new int[partition.CellCount + 1];
        var weights = new double[count];
        var codes = blocks.Select(_ => new int[count]).ToArray();
        for (var c = 0; c < partition.CellCount; c++)
        {
            cellStarts[c + 1] = cellStarts[c];
            for (var i = partition.Values.Starts[c]; i < partition.Values.Starts[c + 1]; i++)
            {
                cellStarts[c + 1] = Math.Max(cellStarts[c + 1], settings[i] + 1);
            }
        }

        for (var g = 0; g < count; g++)
        {
            weights[g] = starts[g + 1] - starts[g];
            var row = partition.RowOrder[permutation[starts[g]]];
            for (var j = 0; j < blocks.Count; j++)
            {
                codes[j][g] = blocks[j].Codes[row];
            }
        }

        var between = CellBlockFit.Build(cellStarts, codes.Select((c, j) => LevelCodes.From(c, blocks[j].Levels.Count)).ToArray(), weights);
        return between is null ? null : new SettingRss(permutation, starts, between, settings.Length - between.Rank);
    }

    public double Of(ReadOnlySpan<double> v) => Of(new SpanValues(v));

    /// <summary>The residual sum of squares of y read on demand: the same loops, and value, as for its copy.</summary>
    public double Of(ShiftedValues y) => Of<ShiftedValues>(y);

    private double Of<TValues>(TValues v)
        where TValues : IIndexedValues, allows ref struct
    {
        var total = 0.0;
        var means = new double[Starts.Length - 1];
        for (var g = 0; g < means.Length; g++)
        {
            var sum = 0.0;
            for (var k = Starts[g]; k < Starts[g + 1]; k++)
            {
                sum += v[Permutation[k]];
            }

            means[g] = sum / (Starts[g + 1] - Starts[g]);
            for (var k = Starts[g]; k < Starts[g + 1]; k++)
            {
                var d = v[Permutation[k]] - means[g];
                total += d * d;
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
