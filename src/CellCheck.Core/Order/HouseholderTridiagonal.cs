namespace CellCheck.Core.Order;

/// <summary>
/// Reduction of a real symmetric matrix to symmetric tridiagonal form by Householder similarity transformations
/// (Golub &amp; Van Loan 2013, Matrix Computations, 4th ed., Algorithm 8.3.1), keeping the eigenvalues and discarding the
/// transformations. Only the lower triangle is stored and updated; each step is one symmetric matrix-vector product
/// and one symmetric rank-two update of the trailing block, about 4n³/3 floating-point operations in all.
/// </summary>
/// <remarks>Eigenvalues only: MathNet's symmetric eigen decomposition also accumulates the eigenvectors and took
/// 13 s at n = 1500 on the development machine, against 1.5 s for this reduction.</remarks>
internal static class HouseholderTridiagonal
{
    /// <summary>
    /// Reduces the matrix whose lower triangle is held in <paramref name="lower"/> (row i holds columns 0..i; the rows
    /// are overwritten) and returns its diagonal and sub-diagonal (length n − 1).
    /// </summary>
    internal static (double[] Diagonal, double[] OffDiagonal) Reduce(double[][] lower)
    {
        var n = lower.Length;
        var d = new double[n];
        var e = new double[Math.Max(0, n - 1)];
        var v = new double[n];
        var p = new double[n];
        for (var k = 0; k < n - 2; k++)
        {
            d[k] = lower[k][k];
            var m = n - k - 1;
            var x0 = lower[k + 1][k];
            var sigma = 0.0;
            for (var i = 1; i < m; i++)
            {
                sigma += lower[k + 1 + i][k] * lower[k + 1 + i][k];
            }

            if (sigma == 0.0)
            {
                e[k] = x0;
                continue;
            }

            // Householder vector with v[0] = 1 and H x = ‖x‖ e₁, the cancellation-free choice of v₀ (GVL Algorithm 5.1.1)
            var mu = Math.Sqrt((x0 * x0) + sigma);
            var v0 = x0 <= 0 ? x0 - mu : -sigma / (x0 + mu);
            var beta = 2 * v0 * v0 / (sigma + (v0 * v0));
            e[k] = mu;
            v[0] = 1.0;
            for (var i = 1; i < m; i++)
            {
                v[i] = lower[k + 1 + i][k] / v0;
            }

            var vs = v.AsSpan(0, m);
            var ps = p.AsSpan(0, m);
            ps.Clear();
            for (var i = 0; i < m; i++)
            {
                var row = lower[k + 1 + i];
                ps[i] += VectorKernels.DotAndAccumulate(row.AsSpan(k + 1, i), vs[..i], vs[i], ps[..i]) + (row[k + 1 + i] * vs[i]);
            }

            var pv = 0.0;
            for (var i = 0; i < m; i++)
            {
                ps[i] *= beta;
                pv += ps[i] * vs[i];
            }

            // w = p − (β p·v / 2) v, and the trailing block becomes A − v wᵀ − w vᵀ
            var half = beta * pv / 2;
            for (var i = 0; i < m; i++)
            {
                ps[i] -= half * vs[i];
            }

            for (var i = 0; i < m; i++)
            {
                VectorKernels.SubtractTwo(lower[k + 1 + i].AsSpan(k + 1, i + 1), vs[i], ps[..(i + 1)], ps[i], vs[..(i + 1)]);
            }
        }

        if (n >= 2)
        {
            d[n - 2] = lower[n - 2][n - 2];
            e[n - 2] = lower[n - 1][n - 2];
        }

        if (n >= 1)
        {
            d[n - 1] = lower[n - 1][n - 1];
        }

        return (d, e);
    }
}
