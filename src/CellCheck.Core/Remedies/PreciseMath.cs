using System.Runtime.Intrinsics;

namespace CellCheck.Core.Remedies;

/// <summary>
/// exp(x) − 1 and log(1 + x) without the cancellation of the plain formulas near x = 0 (the BCL's versions are the
/// plain formulas). Both use the rounded u = e^x or u = 1 + x and correct by the exact ratio (Kahan's method, in
/// Higham 2002, Accuracy and Stability of Numerical Algorithms, 2nd ed., §1.14.1 and problem 1.5); e^x − 1 for
/// |x| &lt; 1/2 by its Taylor series instead, which is as accurate and needs no logarithm (the Box-Cox profile calls it
/// hundreds of thousands of times per λ on large designs).
/// </summary>
internal static class PreciseMath
{
    private static readonly double[] InverseFactorial = Factorials();

    private static double[] Factorials()
    {
        var result = new double[18];
        var factorial = 1.0;
        for (var k = 1; k < result.Length; k++)
        {
            factorial *= k;
            result[k] = 1 / factorial;
        }

        return result;
    }

    /// <summary>e^x − 1.</summary>
    public static double ExpM1(double x) => ExpM1(x, double.NaN);

    /// <summary>e^x − 1, given <paramref name="exp"/> = Math.Exp(x) when the caller has it already (NaN when not):
    /// the same double as <see cref="ExpM1(double)"/>, without computing the exponential again.</summary>
    public static double ExpM1(double x, double exp)
    {
        if (Math.Abs(x) < 0.5)
        {
            // Taylor series by Horner's rule: 18 terms leave a remainder below 0.5^19/19! ≈ 1.6e-23, far under one ulp
            var sum = 1.0 / 6402373705728000; // 1/18!
            for (var k = 17; k >= 1; k--)
            {
                sum = (sum * x) + InverseFactorial[k];
            }

            return sum * x;
        }

        var u = double.IsNaN(exp) ? Math.Exp(x) : exp;
        if (u == 1)
        {
            return x;
        }

        var um1 = u - 1;
        return um1 == -1 || double.IsInfinity(u) ? um1 : um1 * x / Math.Log(u);
    }

    /// <summary>e^x − 1 for each x with |x| &lt; 1/2, by the same series and the same operations as
    /// <see cref="ExpM1(double)"/> there (so the same doubles); other entries get meaningless values. The length is a
    /// multiple of four. The series runs term by term across all entries (four per vector), so the independent
    /// evaluations overlap instead of each waiting on its own chain of multiply-adds.</summary>
    public static void ExpM1Near(ReadOnlySpan<double> x, Span<double> result)
    {
        var width = Vector256<double>.Count;
        result[..x.Length].Fill(1.0 / 6402373705728000);
        for (var k = 17; k >= 1; k--)
        {
            var c = Vector256.Create(InverseFactorial[k]);
            for (var i = 0; i < x.Length; i += width)
            {
                ((Vector256.Create(result.Slice(i, width)) * Vector256.Create(x.Slice(i, width))) + c).CopyTo(result.Slice(i, width));
            }
        }

        for (var i = 0; i < x.Length; i += width)
        {
            (Vector256.Create(result.Slice(i, width)) * Vector256.Create(x.Slice(i, width))).CopyTo(result.Slice(i, width));
        }
    }

    /// <summary>log(1 + x) for x &gt; −1.</summary>
    public static double Log1P(double x)
    {
        var u = 1 + x;
        return u == 1 ? x : Math.Log(u) * x / (u - 1);
    }
}
