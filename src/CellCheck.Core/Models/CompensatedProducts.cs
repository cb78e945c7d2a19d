namespace CellCheck.Core.Models;

/// <summary>
/// Fitted values, residuals and sums of squares accumulated in double-double arithmetic: each product is split
/// exactly into a rounded part and its error with a fused multiply-add, and each sum with Knuth's TwoSum
/// (Ogita, Rump &amp; Oishi 2005, "Accurate sum and dot product", SIAM J. Sci. Comput. 26, 1955-1988, Algorithm Dot2).
/// The result is as accurate as if computed in about twice the working precision, then rounded once.
/// </summary>
internal static class CompensatedProducts
{
    /// <summary>
    /// For each row i: fitted[i] = Σ_j x[i, columns[j]] b[j] and residual[i] = y[i] − that sum, both rounded once
    /// from the double-double value (so residual is not the rounded difference of two rounded numbers).
    /// </summary>
    public static void FitAndResidual(double[,] x, double[] y, ReadOnlySpan<int> columns, ReadOnlySpan<double> b,
        Span<double> fitted, Span<double> residual)
    {
        for (var i = 0; i < y.Length; i++)
        {
            double hi = 0, lo = 0;
            for (var j = 0; j < columns.Length; j++)
            {
                AddProduct(ref hi, ref lo, x[i, columns[j]], b[j]);
            }

            fitted[i] = hi + lo;
            var (rHi, rErr) = TwoSum(y[i], -hi);
            residual[i] = rHi + (rErr - lo);
        }
    }

    /// <summary>f[i] = y[i] − r[i] − Σ_j x[i, columns[j]] b[j], accumulated in double-double and rounded once.</summary>
    public static void AugmentedResidual(double[,] x, double[] y, ReadOnlySpan<int> columns, ReadOnlySpan<double> b,
        ReadOnlySpan<double> r, Span<double> f)
    {
        for (var i = 0; i < y.Length; i++)
        {
            var (hi, lo) = TwoSum(y[i], -r[i]);
            for (var j = 0; j < columns.Length; j++)
            {
                AddProduct(ref hi, ref lo, x[i, columns[j]], -b[j]); // negating a factor negates product and error exactly
            }

            f[i] = hi + lo;
        }
    }

    /// <summary>g[j] = Σ_i x[i, columns[j]] r[i], accumulated in double-double and rounded once.</summary>
    public static void TransposedProduct(double[,] x, ReadOnlySpan<int> columns, ReadOnlySpan<double> r, Span<double> g)
    {
        for (var j = 0; j < columns.Length; j++)
        {
            double hi = 0, lo = 0;
            for (var i = 0; i < r.Length; i++)
            {
                AddProduct(ref hi, ref lo, x[i, columns[j]], r[i]);
            }

            g[j] = hi + lo;
        }
    }

    /// <summary>Σ v² with the same error-free transformations (Ogita, Rump &amp; Oishi 2005, Algorithm Dot2).</summary>
    public static double SumOfSquares(ReadOnlySpan<double> v)
    {
        double hi = 0, lo = 0;
        foreach (var value in v)
        {
            AddProduct(ref hi, ref lo, value, value);
        }

        return hi + lo;
    }

    /// <summary>(hi, lo) += a·b: the product split exactly by a fused multiply-add, the sum by TwoSum.</summary>
    private static void AddProduct(ref double hi, ref double lo, double a, double b)
    {
        var product = a * b;
        var productError = Math.FusedMultiplyAdd(a, b, -product);
        (hi, var sumError) = TwoSum(hi, product);
        lo += sumError + productError;
    }

    /// <summary>Knuth's TwoSum: s = fl(a + b) and the exact error e with a + b = s + e.</summary>
    private static (double Sum, double Error) TwoSum(double a, double b)
    {
        var s = a + b;
        var bVirtual = s - a;
        var aVirtual = s - bVirtual;
        return (s, (a - aVirtual) + (b - bVirtual));
    }
}
