using System.Numerics;

namespace CellCheck.Core.Order;

/// <summary>Span kernels written with <see cref="Vector{T}"/> for the order checks' inner loops: the reduction to
/// tridiagonal form reads and updates every trailing row once per step, and the blocked Durbin-Watson moments add a
/// mean vector per position, so these loops carry almost all of their time. Each element is updated on its own, so
/// the results are the same doubles as a scalar loop's.</summary>
internal static class VectorKernels
{
    /// <summary>Returns Σ r_j v_j and adds s·r_j to acc_j for every j, in one pass over <paramref name="r"/>.</summary>
    internal static double DotAndAccumulate(ReadOnlySpan<double> r, ReadOnlySpan<double> v, double s, Span<double> acc)
    {
        var width = Vector<double>.Count;
        var scale = new Vector<double>(s);
        var sum = Vector<double>.Zero;
        var j = 0;
        for (; j <= r.Length - width; j += width)
        {
            var rj = new Vector<double>(r[j..]);
            sum += rj * new Vector<double>(v[j..]);
            (new Vector<double>(acc[j..]) + (scale * rj)).CopyTo(acc[j..]);
        }

        var total = Vector.Sum(sum);
        for (; j < r.Length; j++)
        {
            total += r[j] * v[j];
            acc[j] += s * r[j];
        }

        return total;
    }

    /// <summary>r_j ← r_j − a·x_j − b·y_j for every j (a symmetric rank-two update of one row).</summary>
    internal static void SubtractTwo(Span<double> r, double a, ReadOnlySpan<double> x, double b, ReadOnlySpan<double> y)
    {
        var width = Vector<double>.Count;
        var va = new Vector<double>(a);
        var vb = new Vector<double>(b);
        var j = 0;
        for (; j <= r.Length - width; j += width)
        {
            var updated = new Vector<double>(r[j..]) - (va * new Vector<double>(x[j..])) - (vb * new Vector<double>(y[j..]));
            updated.CopyTo(r[j..]);
        }

        for (; j < r.Length; j++)
        {
            r[j] -= (a * x[j]) + (b * y[j]);
        }
    }

    /// <summary>acc_j ← acc_j + x_j for every j.</summary>
    internal static void Add(Span<double> acc, ReadOnlySpan<double> x)
    {
        var width = Vector<double>.Count;
        var j = 0;
        for (; j <= x.Length - width; j += width)
        {
            (new Vector<double>(acc[j..]) + new Vector<double>(x[j..])).CopyTo(acc[j..]);
        }

        for (; j < x.Length; j++)
        {
            acc[j] += x[j];
        }
    }
}
