using CellCheck.Core.Models;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Residuals;

/// <summary>
/// The per-row case values of the absorbed cells-plus-blocks fit (<see cref="CellBlockFit"/>), formed on demand cell
/// by cell from the fit's leverage of each row, which is never held as a column: leverage, internally and externally
/// studentized residuals and Cook's distances (<see cref="CaseDiagnostics"/>, the same values row for row). A large
/// check reads each at most once; only per-row output keeps them.
/// </summary>
internal sealed class CellBlockCases
{
    private readonly CellBlockFit _fit;
    private readonly int[] _starts;
    private readonly double[] _residuals;
    private readonly double _rss;
    private readonly int _df;

    public CellBlockCases(CellBlockFit fit, int[] starts, double[] residuals, double rss, int df) =>
        (_fit, _starts, _residuals, _rss, _df) = (fit, starts, residuals, rss, df);

    public double[] Leverage() => Fill((_, h, target) => h.CopyTo(target));

    public double[] Studentized() => Fill((e, h, target) => CaseDiagnostics.Compute(e, h, _rss, _df, _fit.Rank, target, [], []));

    public double[] StudentizedExternal() => Fill((e, h, target) => CaseDiagnostics.Compute(e, h, _rss, _df, _fit.Rank, [], target, []));

    public double[] CooksDistance() => Fill((e, h, target) => CaseDiagnostics.Compute(e, h, _rss, _df, _fit.Rank, [], [], target));

    private delegate void CellRows(ReadOnlySpan<double> residuals, ReadOnlySpan<double> leverage, Span<double> target);

    /// <summary>The outlier screen of the externally studentized residuals (<see cref="OutlierScreen"/>), formed cell by
    /// cell instead of read from a column: the same rows and values, without an array as long as the data. One pass
    /// finds the count, the extreme row and every row at or above the threshold of the rows expected to be screened;
    /// the threshold grows with the count, so when at least that many are screened those rows hold every row named,
    /// and otherwise a second pass at the true threshold finds them.</summary>
    /// <param name="leverageOneRows">Rows whose leverage is not below one: the others are expected to be screened.</param>
    public IReadOnlyList<(int Row, double T, double PAdjusted)> ScreenExternal(int residualDf, int leverageOneRows, out int screened)
    {
        screened = 0;
        var expected = _residuals.Length - leverageOneRows;
        if (residualDf < OutlierScreen.MinimumResidualDf)
        {
            return [];
        }

        var first = Pass(expected > 0 ? OutlierScreen.Threshold(expected, residualDf) : double.PositiveInfinity);
        screened = first.Count;
        if (first.Extreme < 0)
        {
            return [];
        }

        var threshold = OutlierScreen.Threshold(first.Count, residualDf);
        var rows = expected > 0 && first.Count >= expected ? first.AtLeast : Pass(threshold).AtLeast;
        if (!rows.Exists(r => r.Row == first.Extreme))
        {
            rows.Add((first.Extreme, first.Largest));
            rows.Sort((x, y) => x.Row.CompareTo(y.Row));
        }

        var named = new List<(int Row, double T, double PAdjusted)>();
        foreach (var (row, t) in rows)
        {
            if (OutlierScreen.Candidate(row, t, first.Extreme, threshold, first.Count, residualDf) is { } candidate)
            {
                named.Add(candidate);
            }
        }

        return OutlierScreen.Ranked(named);
    }

    /// <summary>One pass over the externally studentized residuals, ranges of cells side by side: the finite count, the
    /// first row of largest |t| and its t, and the rows with |t| at least <paramref name="floor"/>, in row order.</summary>
    private (int Count, int Extreme, double Largest, List<(int Row, double T)> AtLeast) Pass(double floor)
    {
        var gate = new object();
        var (count, extreme, largest) = (0, -1, 0.0);
        var ranges = new List<(int First, List<(int Row, double T)> Rows)>();
        ForEachExternal((first, end, external) =>
        {
            var (finite, row, value, atLeast) = (0, -1, 0.0, new List<(int Row, double T)>());
            for (var c = first; c < end; c++)
            {
                var t = external(c);
                var (n, at) = OutlierScreen.Extreme(t, _starts[c]);
                finite += n;
                if (at >= 0 && (row < 0 || Math.Abs(t[at - _starts[c]]) > Math.Abs(value)))
                {
                    (row, value) = (at, t[at - _starts[c]]);
                }

                for (var i = 0; i < t.Length; i++)
                {
                    if (Math.Abs(t[i]) >= floor && double.IsFinite(t[i]))
                    {
                        atLeast.Add((_starts[c] + i, t[i]));
                    }
                }
            }

            lock (gate)
            {
                count += finite;
                ranges.Add((first, atLeast));
                // the first largest |t| in row order, as one pass over the column finds it
                if (row >= 0 && (extreme < 0 || Math.Abs(value) > Math.Abs(largest) || (Math.Abs(value) == Math.Abs(largest) && row < extreme)))
                {
                    (extreme, largest) = (row, value);
                }
            }
        });
        return (count, extreme, largest, [.. ranges.OrderBy(r => r.First).SelectMany(r => r.Rows)]);
    }

    private delegate ReadOnlySpan<double> CellExternal(int cell);

    /// <summary>Ranges of cells side by side; each range reads its cells' externally studentized residuals, one cell at
    /// a time, from a scratch row of its own.</summary>
    private void ForEachExternal(Action<int, int, CellExternal> range) =>
        GroupChunks.ForEach(_starts, (first, end) =>
        {
            var largest = GroupChunks.LargestSize(_starts, first, end);
            var (h, t) = (new double[largest], new double[largest]);
            range(first, end, c =>
            {
                var (from, length) = (_starts[c], _starts[c + 1] - _starts[c]);
                CellLeverage(c, h);
                CaseDiagnostics.Compute(_residuals.AsSpan(from, length), h.AsSpan(0, length), _rss, _df, _fit.Rank, [], t.AsSpan(0, length), []);
                return t.AsSpan(0, length);
            });
        });

    /// <summary>One value per row, ranges of cells side by side, each cell's leverages in a scratch row of its range.</summary>
    private double[] Fill(CellRows rows)
    {
        var target = new double[_residuals.Length];
        GroupChunks.ForEach(_starts, (first, end) =>
        {
            var h = new double[GroupChunks.LargestSize(_starts, first, end)];
            for (var c = first; c < end; c++)
            {
                var (from, length) = (_starts[c], _starts[c + 1] - _starts[c]);
                CellLeverage(c, h);
                rows(_residuals.AsSpan(from, length), h.AsSpan(0, length), target.AsSpan(from, length));
            }
        });
        return target;
    }

    /// <summary>The leverage of each row of cell <paramref name="c"/>, into the front of <paramref name="h"/>.</summary>
    private void CellLeverage(int c, double[] h)
    {
        for (var k = 0; k < _starts[c + 1] - _starts[c]; k++)
        {
            h[k] = _fit.Leverage(c, _starts[c] + k);
        }
    }
}
