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

    /// <summary>2¹²⁸: data whose largest magnitude lies outside [2⁻¹²⁸, 2¹²⁸] are rescaled before any power is summed.</summary>
    private const double ScaleLimit = 3.402823669209385e38;

    /// <summary>
    /// A power of two that brings the largest magnitude of <paramref name="x"/> near 1 when it lies outside
    /// [2⁻¹²⁸, 2¹²⁸] (so fourth powers and sums of squares neither overflow nor vanish), else 1. Multiplying by a
    /// power of two is exact, and every test here is unchanged by a common positive scale.
    /// </summary>
    internal static double ScaleFor(ReadOnlySpan<double> x)
    {
        var max = 0.0;
        foreach (var v in x)
        {
            max = Math.Max(max, Math.Abs(v));
        }

        return max == 0 || (max <= ScaleLimit && max >= 1 / ScaleLimit) ? 1.0 : Math.ScaleB(1.0, -Math.ILogB(max));
    }

    /// <summary>The values times <paramref name="scale"/> (a power of two from <see cref="ScaleFor(ReadOnlySpan{double})"/>), in a new array.</summary>
    internal static double[] Scaled(ReadOnlySpan<double> x, double scale)
    {
        var result = new double[x.Length];
        for (var i = 0; i < x.Length; i++)
        {
            result[i] = x[i] * scale;
        }

        return result;
    }

    /// <summary>The groups, rescaled as <see cref="ScaleFor(ReadOnlySpan{double})"/> says (the same object when no rescaling is needed).</summary>
    internal static GroupedValues Scaled(GroupedValues groups)
    {
        var scale = ScaleFor(groups.Values);
        return scale == 1.0 ? groups : new GroupedValues(Scaled(groups.Values, scale), groups.Starts);
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
