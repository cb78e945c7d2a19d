using CellCheck.Core.Statistics;

namespace CellCheck.Core.Calibration;

/// <summary>
/// Computes the two primary statistics of a set of cells, oriented so that larger means more evidence against the
/// assumption: normality 1 − W (or A²) on the pooled internally studentized cell-means residuals, spread the
/// Brown-Forsythe F (plain or with structural zeros removed) or Bartlett's K². NaN when a statistic does not exist.
/// One instance per thread: it owns its scratch buffers.
/// </summary>
internal sealed class PrimaryEvaluator(PrimaryChoice choice, int capacity, int groups, int largest)
{
    private readonly double[] _residuals = new double[capacity];
    private readonly double[] _deviations = new double[capacity];
    private readonly int[] _starts = new int[groups + 1];
    private readonly double[] _scratch = new double[Math.Max(1, largest)];

    /// <summary>Both statistics of cells that each hold two or more values.</summary>
    public (double Normality, double Spread) Evaluate(GroupedValues cells) => (Normality(cells), Spread(cells));

    public double Normality(GroupedValues cells)
    {
        if (choice.Normality == NormalityPrimary.None)
        {
            return double.NaN;
        }

        var ss = 0.0;
        for (var c = 0; c < cells.GroupCount; c++)
        {
            var y = cells.Group(c);
            var mean = Descriptive.Mean(y);
            var start = cells.Starts[c];
            for (var j = 0; j < y.Length; j++)
            {
                var e = y[j] - mean;
                _residuals[start + j] = e;
                ss += e * e;
            }
        }

        var df = cells.Count - cells.GroupCount;
        var s = Math.Sqrt(ss / df);
        if (!(s > 0))
        {
            return double.NaN;
        }

        for (var c = 0; c < cells.GroupCount; c++)
        {
            var scale = s * Math.Sqrt(1.0 - (1.0 / cells.Size(c)));
            for (var i = cells.Starts[c]; i < cells.Starts[c + 1]; i++)
            {
                _residuals[i] /= scale;
            }
        }

        var r = _residuals.AsSpan(0, cells.Count);
        var outcome = choice.Normality == NormalityPrimary.ShapiroWilkPooled ? ShapiroWilk.Test(r) : AndersonDarling.Test(r);
        if (!outcome.IsTestable)
        {
            return double.NaN;
        }

        return choice.Normality == NormalityPrimary.ShapiroWilkPooled ? 1.0 - outcome.Statistic : outcome.Statistic;
    }

    public double Spread(GroupedValues cells) => choice.Spread switch
    {
        SpreadPrimary.BrownForsytheZerosRemoved => BrownForsytheZerosRemoved.Statistic(cells, _deviations, _starts, _scratch),
        SpreadPrimary.BrownForsythe => BrownForsythe.Test(cells) is { IsTestable: true } f ? f.Statistic : double.NaN,
        SpreadPrimary.Bartlett => Bartlett.Test(cells) is { IsTestable: true } b ? b.Statistic : double.NaN,
        _ => double.NaN,
    };
}
