using System.Runtime.CompilerServices;

namespace CellCheck.Core.Models;

/// <summary>
/// The block-contrast columns of a design summarised within cells, as absorbing the cells needs them: per cell the
/// (weighted) number of units and the mean of each contrast column, and C = Σ w x xᵀ − Σ_c n_c x̄_c x̄_cᵀ (p × p, the
/// reduced normal-equation matrix of <see cref="CellBlockFit"/>). Units are added one at a time, in any order; a cell
/// is finished once all its units are in. Shared by the absorbed fit and the blocked Durbin-Watson moments, which
/// summarise the same columns over the fitted rows and over the rows with a run position.
/// </summary>
internal sealed class CentredBlockColumns(int cells, int p)
{
    /// <summary>Per cell, the summed unit weight (its row count when units are rows).</summary>
    public double[] Weight { get; } = new double[cells];

    /// <summary>Per cell, the mean of each contrast column (cell c at c·p).</summary>
    public double[] Mean { get; } = new double[cells * p];

    /// <summary>The cell-centred cross products of the contrast columns.</summary>
    public double[,] C { get; } = new double[p, p];

    /// <param name="columns">The unit's contrast column on each block factor (−1 for the factor's first level).</param>
    [MethodImpl(MethodImplOptions.AggressiveInlining)] // once per row
    public void Add(int cell, ReadOnlySpan<int> columns, double weight)
    {
        Weight[cell] += weight;
        foreach (var a in columns)
        {
            if (a < 0)
            {
                continue;
            }

            Mean[(cell * p) + a] += weight;
            foreach (var b in columns)
            {
                if (b >= 0)
                {
                    C[a, b] += weight;
                }
            }
        }
    }

    /// <summary>Turns the cell's sums into means and takes its part out of C.</summary>
    public void FinishCell(int cell)
    {
        for (var a = 0; a < p && Weight[cell] > 0; a++)
        {
            Mean[(cell * p) + a] /= Weight[cell];
        }

        for (var a = 0; a < p; a++)
        {
            for (var b = 0; b < p; b++)
            {
                C[a, b] -= Weight[cell] * Mean[(cell * p) + a] * Mean[(cell * p) + b];
            }
        }
    }
}
