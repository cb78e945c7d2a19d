namespace CellCheck.Core.Models;

/// <summary>
/// Householder reflections H = I − τ v vᵀ with v₀ = 1, stored as in LAPACK's dlarfg/dlarf (Golub &amp; Van Loan 2013,
/// Matrix Computations, 4th ed., §5.1.2-5.1.4): the reflection maps x to (β, 0, ..., 0) with |β| = ‖x‖ and the sign
/// of β opposite to x₀, which avoids cancellation in v₀ = x₀ − β.
/// </summary>
internal static class Householder
{
    /// <summary>
    /// Turns <paramref name="x"/> (whose norm is <paramref name="norm"/>) into its reflection: x₀ becomes β and
    /// x₁.. the tail of v. Returns τ (0 when x is already a multiple of e₀, where no reflection is needed).
    /// </summary>
    public static double Reflect(Span<double> x, double norm)
    {
        var x0 = x[0];
        var tailZero = true;
        for (var i = 1; i < x.Length && tailZero; i++)
        {
            tailZero = x[i] == 0;
        }

        if (tailZero)
        {
            return 0;
        }

        var beta = x0 >= 0 ? -norm : norm;
        var v0 = x0 - beta;
        for (var i = 1; i < x.Length; i++)
        {
            x[i] /= v0;
        }

        x[0] = beta;
        return (beta - x0) / beta;
    }

    /// <summary>Applies H (reflector vector stored in <paramref name="v"/> with implicit v₀ = 1) to <paramref name="c"/>.</summary>
    public static void Apply(ReadOnlySpan<double> v, double tau, Span<double> c)
    {
        if (tau == 0)
        {
            return;
        }

        var w = c[0];
        for (var i = 1; i < v.Length; i++)
        {
            w += v[i] * c[i];
        }

        w *= tau;
        c[0] -= w;
        for (var i = 1; i < v.Length; i++)
        {
            c[i] -= w * v[i];
        }
    }

    /// <summary>Euclidean norm computed on values divided by the largest magnitude, so that squares neither overflow
    /// nor underflow (the scaling idea of LAPACK's dnrm2).</summary>
    public static double Norm(ReadOnlySpan<double> x)
    {
        var max = 0.0;
        foreach (var v in x)
        {
            max = Math.Max(max, Math.Abs(v));
        }

        if (max == 0)
        {
            return 0;
        }

        var ss = 0.0;
        foreach (var v in x)
        {
            var t = v / max;
            ss += t * t;
        }

        return max * Math.Sqrt(ss);
    }
}
