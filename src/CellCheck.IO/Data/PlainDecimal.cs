namespace CellCheck.IO.Data;

/// <summary>
/// The common case of a response value, a plain decimal numeral ([+-]digits[.digits], at most 18 digits), read as an
/// integer mantissa and a power-of-ten scale without going through <see cref="decimal"/>; and the exact difference of
/// two such numerals, rounded once to double.
/// </summary>
internal static class PlainDecimal
{
    private const int MaxDigits = 18;

    /// <summary>2⁵³: integers below it in magnitude are exact in double.</summary>
    private const double ExactInteger = 9007199254740992.0;

    private static readonly double[] PowersOfTen = [.. Enumerable.Range(0, 2 * MaxDigits + 1).Select(k => Math.Pow(10, k))];

    /// <summary>10⁰ … 10¹⁸ as integers, each the previous times ten.</summary>
    private static readonly long[] IntegerPowers = [.. Enumerable.Range(0, MaxDigits + 1).Select(k => Enumerable.Repeat(10L, k).Aggregate(1L, (p, t) => p * t))];

    public static bool TryParse(ReadOnlySpan<char> text, out long mantissa, out int scale)
    {
        mantissa = 0;
        scale = 0;
        var i = 0;
        var negative = false;
        if (text.Length > 0 && (text[0] == '-' || text[0] == '+'))
        {
            negative = text[0] == '-';
            i = 1;
        }

        var digits = 0;
        var point = false;
        for (; i < text.Length; i++)
        {
            var c = text[i];
            if (c == '.' && !point)
            {
                point = true;
                continue;
            }

            if (!char.IsAsciiDigit(c) || ++digits > MaxDigits)
            {
                return false;
            }

            mantissa = (mantissa * 10) + (c - '0');
            scale += point ? 1 : 0;
        }

        mantissa = negative ? -mantissa : mantissa;
        return digits > 0;
    }

    /// <summary>a·10^−sa − b·10^−sb correctly rounded to double, or null when the exact difference is not below 2⁵³
    /// in units of the finer scale (then the caller takes the slower exact route).</summary>
    public static double? Difference(long a, int sa, long b, int sb)
    {
        if (sa == sb)
        {
            // both below 10¹⁸ in magnitude: the exact difference fits a long, and converts as the wide one would
            var same = (double)(a - b);
            return Math.Abs(same) < ExactInteger ? same / PowersOfTen[sa] : null;
        }

        var s = Math.Max(sa, sb);
        var difference = (a * (Int128)PowersOfTenInteger(s - sa)) - (b * (Int128)PowersOfTenInteger(s - sb));
        var magnitude = (double)difference;
        return Math.Abs(magnitude) < ExactInteger ? magnitude / PowersOfTen[s] : null;
    }

    /// <summary>m·10^−s correctly rounded (one division of exact operands), or null when |m| ≥ 2⁵³ is not exact in double.</summary>
    public static double? ToDouble(long mantissa, int scale) =>
        Math.Abs((double)mantissa) < ExactInteger ? mantissa / PowersOfTen[scale] : null;

    private static long PowersOfTenInteger(int k) => IntegerPowers[k];
}
