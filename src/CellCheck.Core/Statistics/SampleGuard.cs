namespace CellCheck.Core.Statistics;

/// <summary>
/// The shared rule for "no spread": a sample whose range is at most 32 units in the last place of its largest
/// magnitude. Such values differ only in their last five bits, which is the size of ordinary rounding error, so
/// standardising by their spread would only amplify rounding noise.
/// </summary>
internal static class SampleGuard
{
    /// <summary>32 × 2⁻⁵²: the largest range, relative to the largest magnitude, still treated as no spread.</summary>
    internal const double RelativeRangeLimit = 32.0 * 2.220446049250313e-16;

    /// <summary>True when <paramref name="min"/> and <paramref name="max"/> are equal up to rounding.</summary>
    internal static bool HasNoSpread(double min, double max)
    {
        var scale = Math.Max(Math.Abs(min), Math.Abs(max));
        return max - min <= RelativeRangeLimit * scale;
    }

    /// <summary>True when every value of <paramref name="x"/> is equal up to rounding (see the type summary).</summary>
    internal static bool HasNoSpread(ReadOnlySpan<double> x)
    {
        if (x.IsEmpty)
        {
            return true;
        }

        var min = x[0];
        var max = x[0];
        foreach (var v in x)
        {
            min = Math.Min(min, v);
            max = Math.Max(max, v);
        }

        return HasNoSpread(min, max);
    }

    /// <summary>Throws when a value is NaN or infinite: the tests here are defined for finite data only.</summary>
    internal static void RequireFinite(ReadOnlySpan<double> x, string paramName)
    {
        foreach (var v in x)
        {
            if (!double.IsFinite(v))
            {
                throw new ArgumentException("values must be finite (no NaN or infinity)", paramName);
            }
        }
    }
}
