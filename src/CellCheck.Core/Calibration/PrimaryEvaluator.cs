using CellCheck.Core.Statistics;

namespace CellCheck.Core.Calibration;

/// <summary>
/// Computes the two primary statistics from a model's residuals, oriented so that larger means more evidence against
/// the assumption: normality 1 − W (or A²) on the internally studentized residuals that exist (leverage below one),
/// spread the Brown-Forsythe F (plain or with structural zeros removed) or Bartlett's K² on the residuals of the
/// cells with two or more rows. NaN when a statistic does not exist. One instance per thread: it owns its buffers.
/// </summary>
internal sealed class PrimaryEvaluator
{
    private readonly PrimaryChoice _choice;
    private readonly int[] _cellStarts;
    private readonly double[] _usable;
    private readonly double[] _replicated;
    private readonly int[] _replicatedStarts;
    private readonly double[] _deviations;
    private readonly double[] _scratch;

    public PrimaryEvaluator(PrimaryChoice choice, int[] cellStarts)
    {
        _choice = choice;
        _cellStarts = cellStarts;
        var rows = cellStarts[^1];
        var replicated = new List<int>();
        var largest = 1;
        for (var c = 0; c + 1 < cellStarts.Length; c++)
        {
            var n = cellStarts[c + 1] - cellStarts[c];
            if (n >= 2)
            {
                replicated.Add(c);
                largest = Math.Max(largest, n);
            }
        }

        ReplicatedCells = [.. replicated];
        _replicatedStarts = new int[replicated.Count + 1];
        for (var k = 0; k < replicated.Count; k++)
        {
            _replicatedStarts[k + 1] = _replicatedStarts[k] + (cellStarts[replicated[k] + 1] - cellStarts[replicated[k]]);
        }

        _usable = new double[rows];
        _replicated = new double[_replicatedStarts[^1]];
        _deviations = new double[_replicatedStarts[^1]];
        _scratch = new double[largest];
    }

    /// <summary>Indices of the cells with two or more rows.</summary>
    public int[] ReplicatedCells { get; }

    public (double Normality, double Spread) Stats(ReadOnlySpan<double> residuals, ReadOnlySpan<double> studentized) =>
        (Normality(studentized), Spread(residuals));

    private double Normality(ReadOnlySpan<double> studentized)
    {
        if (_choice.Normality == NormalityPrimary.None)
        {
            return double.NaN;
        }

        var m = 0;
        foreach (var r in studentized)
        {
            if (double.IsFinite(r))
            {
                _usable[m++] = r;
            }
        }

        var span = _usable.AsSpan(0, m);
        var outcome = _choice.Normality == NormalityPrimary.ShapiroWilkPooled ? ShapiroWilk.Test(span) : AndersonDarling.Test(span);
        if (!outcome.IsTestable)
        {
            return double.NaN;
        }

        return _choice.Normality == NormalityPrimary.ShapiroWilkPooled ? 1.0 - outcome.Statistic : outcome.Statistic;
    }

    private double Spread(ReadOnlySpan<double> residuals)
    {
        if (_choice.Spread == SpreadPrimary.None || ReplicatedCells.Length < 2)
        {
            return double.NaN;
        }

        for (var k = 0; k < ReplicatedCells.Length; k++)
        {
            var c = ReplicatedCells[k];
            residuals[_cellStarts[c].._cellStarts[c + 1]].CopyTo(_replicated.AsSpan(_replicatedStarts[k]));
        }

        var cells = new GroupedValues(_replicated, _replicatedStarts);
        return _choice.Spread switch
        {
            SpreadPrimary.BrownForsytheZerosRemoved => BrownForsytheZerosRemoved.Statistic(cells, _deviations, new int[_replicatedStarts.Length], _scratch),
            SpreadPrimary.BrownForsythe => BrownForsythe.Test(cells) is { IsTestable: true } f ? f.Statistic : double.NaN,
            SpreadPrimary.Bartlett => Bartlett.Test(cells) is { IsTestable: true } b ? b.Statistic : double.NaN,
            _ => double.NaN,
        };
    }
}
