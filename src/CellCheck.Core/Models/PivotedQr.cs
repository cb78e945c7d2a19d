namespace CellCheck.Core.Models;

/// <summary>
/// Householder QR factorization with column pivoting (Businger &amp; Golub 1965, "Linear least squares solutions by
/// Householder transformations", Numer. Math. 7, 269-276) of a column-scaled copy of X, stopped at the numerical rank.
/// </summary>
/// <remarks>
/// The copy is held column-major and factored in place: R on and above the diagonal, the Householder vectors
/// (with an implicit leading 1, as in LAPACK's dgeqp3) below it. At step k the column with the largest remaining norm
/// over rows k..n−1 is moved to position k. Those partial norms are recomputed at every step instead of being
/// downdated as in the original algorithm: about half as much work again as the factorization, but free of the
/// cancellation that downdating suffers once a column is nearly in the span of the chosen ones (Drmač &amp; Bujanović
/// 2008, "On the failure of rank-revealing QR factorization software - a case study", ACM Trans. Math. Softw. 35,
/// article 12). Norms within a relative 1e-10 of the largest count as ties and go to the column that came
/// first in X, so that balanced designs (whose 0/1 columns have equal norms up to rounding) pivot reproducibly and
/// exact duplicates alias the later copy. Factoring stops at the first step whose largest remaining norm is below
/// tolerance × |R₀₀|; because the pivoted diagonal never increases, the rank is that step's index.
/// </remarks>
internal sealed class PivotedQr
{
    private readonly double[] a;
    private readonly double[] tau;

    private PivotedQr(double[] a, double[] tau, int n, int[] pivot, double[] scale, int rank)
    {
        this.a = a;
        this.tau = tau;
        Rows = n;
        Pivot = pivot;
        Scale = scale;
        Rank = rank;
    }

    public int Rows { get; }

    /// <summary>Pivot[k] is the column of X at pivoted position k; the first <see cref="Rank"/> are kept.</summary>
    public int[] Pivot { get; }

    /// <summary>The Euclidean norm each column of X was divided by (1 for a zero column).</summary>
    public double[] Scale { get; }

    public int Rank { get; }

    /// <summary>Copies and scales X, then factors the copy in place.</summary>
    public static PivotedQr Factor(double[,] x, double tolerance)
    {
        int n = x.GetLength(0), p = x.GetLength(1);
        var a = new double[n * p];
        var scale = new double[p];
        var pivot = new int[p];
        for (var j = 0; j < p; j++)
        {
            var col = a.AsSpan(j * n, n);
            for (var i = 0; i < n; i++)
            {
                col[i] = x[i, j];
            }

            var norm = Householder.Norm(col);
            scale[j] = norm > 0 ? norm : 1.0;
            for (var i = 0; i < n; i++)
            {
                col[i] /= scale[j];
            }

            pivot[j] = j;
        }

        var tau = new double[Math.Min(n, p)];
        var rank = 0;
        var r00 = 0.0;
        for (var k = 0; k < tau.Length; k++)
        {
            var best = ColumnPivoting.Choose(a, n, p, k, pivot, out var bestNorm);
            if (bestNorm == 0 || (k > 0 && bestNorm < tolerance * r00))
            {
                break;
            }

            ColumnPivoting.Swap(a, n, k, best, pivot);
            tau[k] = Householder.Reflect(a.AsSpan(k * n + k, n - k), bestNorm);
            r00 = k == 0 ? Math.Abs(a[0]) : r00;
            for (var j = k + 1; j < p; j++)
            {
                Householder.Apply(a.AsSpan(k * n + k, n - k), tau[k], a.AsSpan(j * n + k, n - k));
            }

            rank = k + 1;
        }

        return new PivotedQr(a, tau, n, pivot, scale, rank);
    }

    /// <summary>R[i, j] of the pivoted, scaled factorization (i ≤ j &lt; Rank).</summary>
    public double R(int i, int j) => a[j * Rows + i];

    /// <summary>Overwrites <paramref name="v"/> (length n) with Qᵀv, using the first Rank reflectors.</summary>
    public void ApplyQt(Span<double> v)
    {
        for (var k = 0; k < Rank; k++)
        {
            Householder.Apply(a.AsSpan(k * Rows + k, Rows - k), tau[k], v[k..]);
        }
    }

    /// <summary>Overwrites <paramref name="v"/> (length n) with Qv, using the first Rank reflectors.</summary>
    public void ApplyQ(Span<double> v)
    {
        for (var k = Rank - 1; k >= 0; k--)
        {
            Householder.Apply(a.AsSpan(k * Rows + k, Rows - k), tau[k], v[k..]);
        }
    }

    /// <summary>Solves R₁₁ z = c[0..Rank) by back substitution, in place.</summary>
    public void SolveUpper(Span<double> c)
    {
        for (var i = Rank - 1; i >= 0; i--)
        {
            var s = c[i];
            for (var j = i + 1; j < Rank; j++)
            {
                s -= R(i, j) * c[j];
            }

            c[i] = s / R(i, i);
        }
    }

    /// <summary>Solves R₁₁ᵀ h = g[0..Rank) by forward substitution, in place.</summary>
    public void SolveUpperTransposed(Span<double> g)
    {
        for (var i = 0; i < Rank; i++)
        {
            var s = g[i];
            for (var j = 0; j < i; j++)
            {
                s -= R(j, i) * g[j];
            }

            g[i] = s / R(i, i);
        }
    }
}
