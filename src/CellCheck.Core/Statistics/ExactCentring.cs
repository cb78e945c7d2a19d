namespace CellCheck.Core.Statistics;

/// <summary>
/// Removes a common origin from decimal input before it becomes binary floating point. Values such as
/// 1000000000000.4 (NIST StRD SmLs07-09) are not representable in double: the spacing of doubles near 10¹² is
/// 1.2e-4, so parsing them directly loses about four of the digits that carry the variation. Subtracting the first
/// value in decimal arithmetic first leaves small numbers (0.1, −0.2, ...) that convert with relative error of one
/// rounding. Location-invariant statistics (sums of squares about means, F, spread tests) are unaffected by the shift.
/// </summary>
public static class ExactCentring
{
    /// <summary>
    /// Returns <c>values[i] − origin</c> as doubles, with <paramref name="origin"/> the first value (0 for an empty
    /// span). The subtraction is exact in <see cref="decimal"/> whenever the difference fits in 28 significant digits,
    /// which holds for any input written with at most 28 significant digits at a common scale; the conversion to
    /// double then rounds once.
    /// </summary>
    public static double[] Centre(ReadOnlySpan<decimal> values, out decimal origin)
    {
        origin = values.IsEmpty ? 0m : values[0];
        var centred = new double[values.Length];
        for (var i = 0; i < values.Length; i++)
        {
            centred[i] = (double)(values[i] - origin);
        }

        return centred;
    }
}
