using System.Runtime.CompilerServices;
using CellCheck.Core.Data;

namespace CellCheck.Core.Order;

/// <summary>The per-position updates of <see cref="BlockTraceSums"/>: a position's block contrasts decoded once, and the
/// indicator and cross-table parts of z_a z_bᵀ added for a pair of positions.</summary>
internal static class TraceUpdates
{
    /// <summary>The contrast column of each block factor at position <paramref name="t"/>.</summary>
    public static void Decode(LevelCodes[] dummy, int t, Span<int> target)
    {
        for (var j = 0; j < dummy.Length; j++)
        {
            target[j] = dummy[j][t];
        }
    }

    /// <summary>Adds weight·(z_a z_bᵀ) (and its transpose when <paramref name="symmetric"/>) to the indicator part and
    /// the cross table (the cell-mean part is added per cell), for positions a and b with contrast columns
    /// <paramref name="za"/> and <paramref name="zb"/> in cells <paramref name="cellA"/> and <paramref name="cellB"/>.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)] // called several times per position
    public static void Pair(ReadOnlySpan<int> za, ReadOnlySpan<int> zb, int cellA, int cellB, double weight, double[,] ee, double[] cross, int cells, bool symmetric = false)
    {
        for (var j = 0; j < za.Length; j++)
        {
            var i = za[j];
            if (i >= 0)
            {
                cross[(i * cells) + cellB] += weight;
                foreach (var k in zb)
                {
                    if (k >= 0)
                    {
                        ee[i, k] += weight;
                        if (symmetric)
                        {
                            ee[k, i] += weight;
                        }
                    }
                }
            }

            var kb = zb[j];
            if (symmetric && kb >= 0)
            {
                cross[(kb * cells) + cellA] += weight;
            }
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)] // called several times per position
    public static void Indicators(ReadOnlySpan<int> z, double[] target, int offset, double weight)
    {
        foreach (var i in z)
        {
            if (i >= 0)
            {
                target[offset + i] += weight;
            }
        }
    }
}
