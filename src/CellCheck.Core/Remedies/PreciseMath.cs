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
    public static double ExpM1(double x)
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

        var u = Math.Exp(x);
        if (u == 1)
        {
            return x;
        }

        var um1 = u - 1;
        return um1 == -1 || double.IsInfinity(u) ? um1 : um1 * x / Math.Log(u);
    }

    /// <summary>log(1 + x) for x &gt; −1.</summary>
    public static double Log1P(double x)
    {
        var u = 1 + x;
        return u == 1 ? x : Math.Log(u) * x / (u - 1);
    }
}
