namespace CellCheck.Core.Tests.Support;

/// <summary>Comparison of computed values with check values.</summary>
internal static class Accuracy
{
    /// <summary>|actual − expected| / |expected| (the absolute error when expected is 0).</summary>
    public static double RelativeError(double expected, double actual) =>
        expected == 0 ? Math.Abs(actual) : Math.Abs(actual - expected) / Math.Abs(expected);

    /// <summary>Log relative error, −log10 of the relative error (McCullough 1998, "Assessing the reliability of
    /// statistical software", Am. Stat. 52, 358-366): the number of correct significant digits; 15 when exact.</summary>
    public static double Lre(double expected, double actual)
    {
        var e = RelativeError(expected, actual);
        return e == 0 ? 15.0 : Math.Min(15.0, -Math.Log10(e));
    }

    /// <summary>Asserts that <paramref name="actual"/> is within <paramref name="tolerance"/> relative error of
    /// <paramref name="expected"/>, reporting the observed error on failure.</summary>
    public static void AssertRelative(double expected, double actual, double tolerance, string? what = null)
    {
        var e = RelativeError(expected, actual);
        Assert.True(e <= tolerance, $"{what} expected {expected:R}, got {actual:R}: relative error {e:E2} > {tolerance:E2}");
    }
}
