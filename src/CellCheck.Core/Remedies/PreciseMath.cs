namespace CellCheck.Core.Remedies;

/// <summary>
/// exp(x) − 1 and log(1 + x) without the cancellation of the plain formulas near x = 0 (the BCL's versions are the
/// plain formulas). Both use the rounded u = e^x or u = 1 + x and correct by the exact ratio (Kahan's method, in
/// Higham 2002, Accuracy and Stability of Numerical Algorithms, 2nd ed., §1.14.1 and problem 1.5).
/// </summary>
internal static class PreciseMath
{
    /// <summary>e^x − 1.</summary>
    public static double ExpM1(double x)
    {
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
