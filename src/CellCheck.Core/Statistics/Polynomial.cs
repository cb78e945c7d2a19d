namespace CellCheck.Core.Statistics;

/// <summary>Polynomial evaluation by Horner's rule.</summary>
internal static class Polynomial
{
    /// <summary>c[0] + c[1]·x + c[2]·x² + … (coefficients lowest power first).</summary>
    internal static double Evaluate(ReadOnlySpan<double> c, double x)
    {
        var sum = 0.0;
        for (var i = c.Length - 1; i >= 0; i--)
        {
            sum = (sum * x) + c[i];
        }

        return sum;
    }
}
