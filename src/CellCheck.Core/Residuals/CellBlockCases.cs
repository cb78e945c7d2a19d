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
    /// cell twice, for the count and the extreme row and then for the named rows, instead of read from a column: the
    /// same rows and values, without an array as long as the data.</summary>
    public IReadOnlyList<(int Row, double T, double PAdjusted)> ScreenExternal(int residualDf, out int screened)
    {
        screened = 0;
        if (residualDf < OutlierScreen.MinimumResidualDf)
        {
            return [];
        }

        var gate = new object();
        var (count, extreme, largest) = (0, -1, 0.0);
        ForEachExternal((first, end, external) =>
        {
            var (finite, row, value) = (0, -1, 0.0);
            for (var c = first; c < end; c++)
            {
                var t = external(c);
                var (n, at) = OutlierScreen.Extreme(t, _starts[c]);
                finite += n;
                if (at >= 0 && (row < 0 || Math.Abs(t[at - _starts[c]]) > Math.Abs(value)))
                {
                    (row, value) = (at, t[at - _starts[c]]);
                }
            }

            lock (gate)
            {
                count += finite;
                // the first largest |t| in row order, as one pass over the column finds it
                if (row >= 0 && (extreme < 0 || Math.Abs(value) > Math.Abs(largest) || (Math.Abs(value) == Math.Abs(largest) && row < extreme)))
                {
                    (extreme, largest) = (row, value);
                }
            }
        });
        screened = count;
        if (extreme < 0)
        {
            return [];
        }

        var (threshold, total) = (OutlierScreen.Threshold(count, residualDf), count);
        var ranges = new List<(int First, List<(int Row, double T, double PAdjusted)> Named)>();
        ForEachExternal((first, end, external) =>
        {
            var named = new List<(int Row, double T, double PAdjusted)>();
            for (var c = first; c < end; c++)
            {
                var t = external(c);
                for (var i = 0; i < t.Length; i++)
                {
                    if (OutlierScreen.Candidate(_starts[c] + i, t[i], extreme, threshold, total, residualDf) is { } candidate)
                    {
                        named.Add(candidate);
                    }
                }
            }

            lock (gate)
            {
                ranges.Add((first, named));
            }
        });
        return OutlierScreen.Ranked([.. ranges.OrderBy(r => r.First).SelectMany(r => r.Named)]);
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
