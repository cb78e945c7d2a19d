using CellCheck.IO.Data;

namespace CellCheck.IO.Tests.Data;

/// <summary>The integer route for plain decimal numerals against the decimal type's exact arithmetic (the slower route it replaces).</summary>
public sealed class PlainDecimalTests
{
    [Theory]
    [InlineData("100.427", 100427L, 3)]
    [InlineData("-0.5", -5L, 1)]
    [InlineData("+12", 12L, 0)]
    [InlineData(".25", 25L, 2)]
    [InlineData("7.", 7L, 0)]
    [InlineData("1.50", 150L, 2)]
    public void A_plain_numeral_reads_as_mantissa_and_scale(string text, long mantissa, int scale)
    {
        Assert.True(PlainDecimal.TryParse(text, out var m, out var s));
        Assert.Equal(mantissa, m);
        Assert.Equal(scale, s);
    }

    [Theory]
    [InlineData("1e5")]
    [InlineData("1.2.3")]
    [InlineData("-")]
    [InlineData(".")]
    [InlineData("12a")]
    [InlineData("1234567890123456789")] // 19 digits: left to decimal
    public void Anything_else_is_left_to_the_general_route(string text) => Assert.False(PlainDecimal.TryParse(text, out _, out _));

    [Theory]
    [InlineData("1000000000000.4", "1000000000000.2")] // NIST SmLs-like digits
    [InlineData("100.427", "98.1")]
    [InlineData("-0.000123", "5")]
    [InlineData("0.1", "0.3")]
    [InlineData("123456789.123456789", "123456789.123456788")]
    public void The_difference_equals_the_decimal_difference_converted_to_double(string a, string b)
    {
        PlainDecimal.TryParse(a, out var ma, out var sa);
        PlainDecimal.TryParse(b, out var mb, out var sb);
        var expected = (double)(decimal.Parse(a, System.Globalization.CultureInfo.InvariantCulture) - decimal.Parse(b, System.Globalization.CultureInfo.InvariantCulture));
        Assert.Equal(expected, PlainDecimal.Difference(ma, sa, mb, sb));
    }

    [Fact]
    public void A_difference_beyond_two_to_the_53_units_is_refused()
    {
        PlainDecimal.TryParse("123456789012345678", out var ma, out var sa);
        Assert.Null(PlainDecimal.Difference(ma, sa, 0, 0));
    }
}
