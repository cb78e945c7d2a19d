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
                for (var k = 0; k < length; k++)
                {
                    h[k] = _fit.Leverage(c, from + k);
                }

                rows(_residuals.AsSpan(from, length), h.AsSpan(0, length), target.AsSpan(from, length));
            }
        });
        return target;
    }
}
