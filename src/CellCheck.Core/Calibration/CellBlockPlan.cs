using CellCheck.Core.Data;
using CellCheck.Core.Models;

namespace CellCheck.Core.Calibration;

/// <summary>The null plan of cells plus additive blocks fitted by absorption (<see cref="CellBlockFit"/>): residuals
/// from the reduced normal equations, studentized by the leverages of the fit.</summary>
internal sealed class CellBlockPlan : INullPlan
{
    /// <summary>A row whose 1 − h is not above this has leverage one: it has no studentized residual.</summary>
    public const double LeverageOne = 1e-10;
    private readonly CellBlockFit _fit;
    private readonly Lazy<double[]> _scale;
    private readonly int _df;

    /// <param name="leverage">Forms the leverage of each row (called only when a simulation asks for residuals).</param>
    /// <param name="usableResiduals">The rows whose 1 − h is above <see cref="LeverageOne"/>.</param>
    public CellBlockPlan(CellBlockFit fit, int[] cellStarts, Func<double[]> leverage, int usableResiduals, IReadOnlyList<LevelCodes> blockCodes)
    {
        _fit = fit;
        CellStarts = cellStarts;
        Rows = cellStarts[^1];
        UsableResiduals = usableResiduals;

        // √(1 − h) per row, built only when a simulation asks for residuals (never above the Monte Carlo size limit)
        _scale = new Lazy<double[]>(() => Array.ConvertAll(leverage(), h => 1.0 - h > LeverageOne ? Math.Sqrt(1.0 - h) : double.NaN));

        _df = Rows - fit.Rank;
        Shape = new DesignShape(Enumerable.Range(0, cellStarts.Length - 1).Select(c => cellStarts[c + 1] - cellStarts[c]));
        var hash = 14695981039346656037UL;
        void Mix(int value)
        {
            hash = unchecked((hash ^ (uint)value) * 1099511628211UL);
        }

        foreach (var start in cellStarts)
        {
            Mix(start);
        }

        foreach (var codes in blockCodes)
        {
            Mix(-1);
            for (var i = 0; i < codes.Length; i++)
            {
                Mix(codes[i]);
            }
        }

        Key = "cells+blocks:" + hash.ToString("x16", System.Globalization.CultureInfo.InvariantCulture);
    }

    public string Key { get; }

    public DesignShape Shape { get; }

    public int Rows { get; }

    public int UsableResiduals { get; }

    public int[] CellStarts { get; }

    public void Residualize(ReadOnlySpan<double> y, Span<double> residuals, Span<double> studentized)
    {
        _fit.Residualize(y, residuals);
        var ss = 0.0;
        foreach (var r in residuals)
        {
            ss += r * r;
        }

        var s = Math.Sqrt(ss / _df);
        for (var i = 0; i < Rows; i++)
        {
            studentized[i] = residuals[i] / (s * _scale.Value[i]);
        }
    }
}
