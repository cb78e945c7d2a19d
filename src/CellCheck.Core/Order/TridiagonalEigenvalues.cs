namespace CellCheck.Core.Order;

/// <summary>
/// All eigenvalues of a real symmetric tridiagonal matrix by bisection on Sturm counts (Golub &amp; Van Loan 2013,
/// Matrix Computations, 4th ed., §8.4.1; the count is the number of negative pivots of the LDLᵀ factorization of
/// T − xI, with Kahan's guard replacing a zero pivot by a tiny negative one). Each eigenvalue is bracketed until the
/// bracket is a few units in the last place of ‖T‖ wide, so the absolute error is of order 1e-16·‖T‖.
/// </summary>
internal static class TridiagonalEigenvalues
{
    private const double Epsilon = 2.220446049250313e-16;

    /// <summary>Eigenvalues in ascending order of the matrix with diagonal <paramref name="d"/> and off-diagonal
    /// <paramref name="e"/> (length n − 1).</summary>
    internal static double[] Ascending(double[] d, double[] e)
    {
        var n = d.Length;
        var values = new double[n];
        if (n == 0)
        {
            return values;
        }

        var lo = double.PositiveInfinity;
        var hi = double.NegativeInfinity;
        var largestSquare = 1.0;
        for (var i = 0; i < n; i++)
        {
            var radius = (i > 0 ? Math.Abs(e[i - 1]) : 0) + (i < n - 1 ? Math.Abs(e[i]) : 0);
            lo = Math.Min(lo, d[i] - radius);
            hi = Math.Max(hi, d[i] + radius);
            if (i < n - 1)
            {
                largestSquare = Math.Max(largestSquare, e[i] * e[i]);
            }
        }

        var norm = Math.Max(Math.Abs(lo), Math.Abs(hi));
        var pivotFloor = 1e-290 * largestSquare;
        var tolerance = 4 * Epsilon * norm;
        lo -= 2 * tolerance;
        hi += 2 * tolerance;

        // Each entry brackets the eigenvalues with indices [countLo, countHi) in [lo, hi).
        var stack = new Stack<(double Lo, double Hi, int CountLo, int CountHi)>();
        stack.Push((lo, hi, 0, n));
        while (stack.Count > 0)
        {
            var (a, b, ca, cb) = stack.Pop();
            if (ca == cb)
            {
                continue;
            }

            var mid = 0.5 * (a + b);
            if (b - a <= tolerance || mid <= a || mid >= b)
            {
                for (var i = ca; i < cb; i++)
                {
                    values[i] = mid;
                }

                continue;
            }

            var c = CountBelow(d, e, mid, pivotFloor);
            stack.Push((a, mid, ca, Math.Clamp(c, ca, cb)));
            stack.Push((mid, b, Math.Clamp(c, ca, cb), cb));
        }

        return values;
    }

    /// <summary>The number of eigenvalues below <paramref name="x"/> (Sylvester's law of inertia on LDLᵀ of T − xI).</summary>
    internal static int CountBelow(double[] d, double[] e, double x, double pivotFloor)
    {
        var count = 0;
        var q = d[0] - x;
        for (var i = 0; ; i++)
        {
            if (Math.Abs(q) < pivotFloor)
            {
                q = -pivotFloor;
            }

            if (q < 0)
            {
                count++;
            }

            if (i == d.Length - 1)
            {
                return count;
            }

            q = d[i + 1] - x - (e[i] * e[i] / q);
        }
    }
}
