namespace CellCheck.Core.Tests.Statistics;

/// <summary>Assertions for floating-point check values: every call site states where the expected value comes
/// from and why the tolerance is what it is.</summary>
internal static class Close
{
    /// <summary>Asserts |actual − expected| ≤ tolerance · |expected|.</summary>
    public static void Relative(double expected, double actual, double tolerance)
    {
        var deviation = Math.Abs(actual - expected) / Math.Abs(expected);
        Assert.True(
            deviation <= tolerance,
            $"expected {expected:R}, got {actual:R}: relative deviation {deviation:E3} exceeds {tolerance:E1}");
    }

    /// <summary>Asserts |actual − expected| ≤ tolerance.</summary>
    public static void Absolute(double expected, double actual, double tolerance)
    {
        var deviation = Math.Abs(actual - expected);
        Assert.True(
            deviation <= tolerance,
            $"expected {expected:R}, got {actual:R}: absolute deviation {deviation:E3} exceeds {tolerance:E1}");
    }
}
