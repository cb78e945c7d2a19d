using CellCheck.Core.Data;
using CellCheck.Core.Remedies;
using MathNet.Numerics.LinearAlgebra;

namespace CellCheck.Core.Models;

/// <summary>
/// Least squares for cells plus additive blocks (y = μ_cell + Σ_j β_j(block level) + e) by absorbing the cell means:
/// only the p block-contrast coefficients are solved for, from the p × p reduced normal equations
/// C β = Q, C = Σ w x xᵀ − Σ_c n_c x̄_c x̄_cᵀ, Q = Σ w x (y − ȳ_c), where x holds a unit's treatment-contrast block
/// indicators and x̄_c, ȳ_c are cell means (Searle 1971, Linear Models, §7.2, "absorbing" one factor; the fit is
/// that of the full dummy-variable regression). Units are rows, or groups of rows with weights (their counts).
/// Time O(n·B + cells·p + p³) and no n × p matrix, so ten million rows with thousands of cells fit in seconds.
/// </summary>
internal sealed class CellBlockFit
{
    private readonly int[] starts;
    private readonly BlockContrasts contrasts;
    private readonly double[]? weights;
    private readonly double[] cellWeight;
    private readonly double[] cellMeanX;
    private readonly double[,] inverse;
    private readonly double[] cellQuadratic;
    private readonly double[] cellProjected;

    private CellBlockFit(int[] starts, BlockContrasts contrasts, double[]? weights, int p, double[] cellWeight, double[] cellMeanX, double[,] inverse)
    {
        this.starts = starts;
        this.contrasts = contrasts;
        this.weights = weights;
        this.cellWeight = cellWeight;
        this.cellMeanX = cellMeanX;
        this.inverse = inverse;
        P = p;
        Cells = cellWeight.Count(w => w > 0);
        var cells = starts.Length - 1;
        cellProjected = new double[cells * p];
        cellQuadratic = new double[cells];
        for (var c = 0; c < cells; c++)
        {
            for (var a = 0; a < p; a++)
            {
                var sum = 0.0;
                for (var b = 0; b < p; b++)
                {
                    sum += inverse[a, b] * cellMeanX[(c * p) + b];
                }

                cellProjected[(c * p) + a] = sum;
                cellQuadratic[c] += cellMeanX[(c * p) + a] * sum;
            }
        }
    }

    /// <summary>Per block factor, the block-contrast column of each level code (−1 for the first level present and for
    /// codes no unit has).</summary>
    public int[][] LevelColumns => contrasts.Levels;

    /// <summary>Number of block-contrast columns.</summary>
    public int P { get; }

    /// <summary>Number of cells holding at least one unit.</summary>
    public int Cells { get; }

    /// <summary>Cells plus block contrasts: the rank of the fit.</summary>
    public int Rank => Cells + P;

    /// <summary>Sets up the fit, or returns null when the block contrasts are not all estimable apart from the cells
    /// (C singular: a block confounded with cells), which the caller leaves to a pivoted QR fit.</summary>
    /// <param name="starts">Units of cell c are starts[c] .. starts[c + 1] − 1.</param>
    /// <param name="blockCodes">Per block factor, the level code of each unit (all non-negative).</param>
    /// <param name="weights">Unit weights (group sizes), or null for one row per unit.</param>
    public static CellBlockFit? Build(int[] starts, IReadOnlyList<LevelCodes> blockCodes, double[]? weights = null)
    {
        var contrasts = BlockContrasts.Treatment(blockCodes, out var p);

        var cells = starts.Length - 1;
        var centred = new CentredBlockColumns(cells, p);
        Span<int> columns = stackalloc int[blockCodes.Count];
        for (var c = 0; c < cells; c++)
        {
            for (var i = starts[c]; i < starts[c + 1]; i++)
            {
                contrasts.Fill(i, columns);
                centred.Add(c, columns, weights?[i] ?? 1.0);
            }

            centred.FinishCell(c);
        }

        var (cellWeight, cellMeanX, c2) = (centred.Weight, centred.Mean, centred.C);
        if (p == 0)
        {
            return new CellBlockFit(starts, contrasts, weights, 0, cellWeight, cellMeanX, new double[0, 0]);
        }

        var matrix = Matrix<double>.Build.DenseOfArray(c2);
        return Estimable(matrix) ? new CellBlockFit(starts, contrasts, weights, p, cellWeight, cellMeanX, matrix.Inverse().ToArray()) : null;
    }

    /// <summary>True when the reduced normal-equation matrix C (symmetric, p ≥ 1) is safely positive definite: its
    /// smallest eigenvalue above 1e-9 of its largest (or of 1), so every block contrast is estimable apart from the cells.</summary>
    public static bool Estimable(Matrix<double> c)
    {
        var eigen = c.Evd(Symmetricity.Symmetric).EigenValues.Select(v => v.Real).ToArray();
        return eigen.Min() > 1e-9 * Math.Max(1.0, eigen.Max());
    }

    /// <summary>Residuals of <paramref name="y"/> (one value per unit, in unit order) on cells plus blocks;
    /// <paramref name="residuals"/> may be <paramref name="y"/> itself (every sum is formed before the first residual is written).</summary>
    public void Residualize(ReadOnlySpan<double> y, Span<double> residuals)
    {
        var sink = new SpanSink(residuals);
        Residualize(new SpanValues(y), ref sink);
    }

    /// <summary>As <see cref="Residualize(ReadOnlySpan{double}, Span{double})"/>, with the values read on demand and
    /// each residual handed to <paramref name="sink"/> in unit order instead of stored: the same doubles, no array.</summary>
    public void Residualize<TValues, TSink>(TValues y, ref TSink sink)
        where TValues : IIndexedValues, allows ref struct
        where TSink : IResidualSink, allows ref struct
    {
        var cells = starts.Length - 1;
        var q = new double[P];
        var means = new double[cells];
        for (var c = 0; c < cells; c++)
        {
            double sum = 0;
            for (var i = starts[c]; i < starts[c + 1]; i++)
            {
                sum += (weights?[i] ?? 1.0) * y[i];
            }

            means[c] = cellWeight[c] > 0 ? sum / cellWeight[c] : 0;
            for (var i = starts[c]; i < starts[c + 1]; i++)
            {
                var d = (weights?[i] ?? 1.0) * (y[i] - means[c]);
                for (var j = 0; j < contrasts.Factors; j++)
                {
                    var a = contrasts.Column(j, i);
                    if (a >= 0)
                    {
                        q[a] += d;
                    }
                }
            }
        }

        var beta = new double[P];
        for (var a = 0; a < P; a++)
        {
            for (var b = 0; b < P; b++)
            {
                beta[a] += inverse[a, b] * q[b];
            }
        }

        for (var c = 0; c < cells; c++)
        {
            var centre = 0.0;
            for (var a = 0; a < P; a++)
            {
                centre += cellMeanX[(c * P) + a] * beta[a];
            }

            for (var i = starts[c]; i < starts[c + 1]; i++)
            {
                var effect = -centre;
                for (var j = 0; j < contrasts.Factors; j++)
                {
                    var a = contrasts.Column(j, i);
                    effect += a >= 0 ? beta[a] : 0;
                }

                sink.Put(i, y[i] - means[c] - effect);
            }
        }
    }

    /// <summary>Leverage of unit i of cell c (for weighted units, of one row of the unit).</summary>
    public double Leverage(int c, int i)
    {
        var h = (1.0 / cellWeight[c]) + cellQuadratic[c];
        for (var j = 0; j < contrasts.Factors; j++)
        {
            var a = contrasts.Column(j, i);
            if (a < 0)
            {
                continue;
            }

            h -= 2 * cellProjected[(c * P) + a];
            for (var k = 0; k < contrasts.Factors; k++)
            {
                var b = contrasts.Column(k, i);
                h += b >= 0 ? inverse[a, b] : 0;
            }
        }

        return h;
    }
}
