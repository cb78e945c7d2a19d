using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearAlgebra.Factorization;

namespace CellCheck.Core.Order;

/// <summary>
/// The matrix M A M of the Durbin-Watson statistic for one design, held through a thin orthonormal basis Q of the
/// columns of X (M = I − QQᵀ) and the first-difference matrix A (tridiagonal with diagonal 1, 2, …, 2, 1 and −1 beside
/// it), so that its traces cost O(np²) and no n × n matrix is formed unless the eigenvalues are wanted.
/// </summary>
/// <remarks>
/// With G = AQ (n × p, applying the tridiagonal A to each column) and H = QᵀAQ (p × p):
/// tr(MA) = tr(A) − tr(QQᵀA) = 2(n − 1) − tr H, and, expanding (A − QQᵀA)² and using the cyclic property,
/// tr((MA)²) = tr(A²) − 2 tr(QᵀA²Q) + tr(QᵀAQQᵀAQ) = 6n − 8 − 2‖G‖²_F + ‖H‖²_F, since the squared entries of A sum to
/// 4(n − 2) + 2 + 2(n − 1) = 6n − 8 and QᵀA²Q = GᵀG. M A M itself is A − QGᵀ − LQᵀ with L = G − QH = MAQ.
/// </remarks>
internal sealed class ProjectedDifference
{
    /// <summary>A column is taken as a linear combination of earlier ones when the part of it orthogonal to them
    /// (|R_kk| of the QR factorization) is below this fraction of its length: exact collinearity leaves rounding
    /// error of about 1e-15, while genuine columns of a designed experiment leave a large part.</summary>
    internal const double RankTolerance = 1e-9;

    private readonly double[][] q;
    private readonly double[][] g;
    private readonly double[,] h;

    private ProjectedDifference(int n, double[][] q, double[][] g, double[,] h)
    {
        N = n;
        this.q = q;
        this.g = g;
        this.h = h;
        var traceH = 0.0;
        var squaresH = 0.0;
        var squaresG = 0.0;
        for (var k = 0; k < q.Length; k++)
        {
            traceH += h[k, k];
            for (var l = 0; l < q.Length; l++)
            {
                squaresH += h[k, l] * h[k, l];
            }

            foreach (var value in g[k])
            {
                squaresG += value * value;
            }
        }

        TraceMA = (2.0 * (n - 1)) - traceH;
        TraceMASquared = (6.0 * n) - 8.0 - (2.0 * squaresG) + squaresH;
    }

    /// <summary>Number of observations.</summary>
    internal int N { get; }

    /// <summary>Number of design columns p.</summary>
    internal int Columns => q.Length;

    /// <summary>tr(MA) = tr(MAM), the sum of the n − p eigenvalues.</summary>
    internal double TraceMA { get; }

    /// <summary>tr((MA)²) = tr((MAM)²), the sum of the squared eigenvalues.</summary>
    internal double TraceMASquared { get; }

    /// <summary>Factors the design. Throws when its columns are linearly dependent (see <see cref="RankTolerance"/>).</summary>
    internal static ProjectedDifference FromDesign(double[,] x)
    {
        var n = x.GetLength(0);
        var p = x.GetLength(1);
        var q = new double[p][];
        if (p > 0)
        {
            var qr = Matrix<double>.Build.DenseOfArray(x).QR(QRMethod.Thin);
            for (var k = 0; k < p; k++)
            {
                var length = 0.0;
                for (var i = 0; i < n; i++)
                {
                    length += x[i, k] * x[i, k];
                }

                if (!(Math.Abs(qr.R[k, k]) > RankTolerance * Math.Sqrt(length)))
                {
                    throw new ArgumentException($"Design column {k} is a linear combination of the columns before it; the design must have full column rank.", nameof(x));
                }

                q[k] = qr.Q.Column(k).ToArray();
            }
        }

        var g = new double[p][];
        var h = new double[p, p];
        for (var k = 0; k < p; k++)
        {
            g[k] = ApplyDifference(q[k]);
            for (var l = 0; l < p; l++)
            {
                var sum = 0.0;
                for (var i = 0; i < n; i++)
                {
                    sum += q[l][i] * g[k][i];
                }

                h[l, k] = sum;
            }
        }

        return new ProjectedDifference(n, q, g, h);
    }

    /// <summary>Ay for the first-difference matrix A = DᵀD, D the (n − 1) × n matrix of first differences.</summary>
    internal static double[] ApplyDifference(ReadOnlySpan<double> y)
    {
        var n = y.Length;
        var result = new double[n];
        for (var i = 0; i < n - 1; i++)
        {
            var step = y[i] - y[i + 1];
            result[i] += step;
            result[i + 1] -= step;
        }

        return result;
    }

    /// <summary>The lower triangle of M A M, row i holding columns 0..i (O(n²p) work, n(n + 1)/2 doubles).</summary>
    internal double[][] LowerTriangle()
    {
        var p = q.Length;
        var rows = new double[N][];
        var l = new double[p][];
        for (var k = 0; k < p; k++)
        {
            l[k] = (double[])g[k].Clone();
            for (var j = 0; j < p; j++)
            {
                for (var i = 0; i < N; i++)
                {
                    l[k][i] -= q[j][i] * h[j, k];
                }
            }
        }

        for (var i = 0; i < N; i++)
        {
            var row = new double[i + 1];
            row[i] = i == 0 || i == N - 1 ? 1.0 : 2.0;
            if (i > 0)
            {
                row[i - 1] = -1.0;
            }

            for (var k = 0; k < p; k++)
            {
                VectorKernels.SubtractTwo(row, q[k][i], g[k].AsSpan(0, i + 1), l[k][i], q[k].AsSpan(0, i + 1));
            }

            rows[i] = row;
        }

        if (N == 1)
        {
            rows[0][0] = 0.0;
        }

        return rows;
    }
}
