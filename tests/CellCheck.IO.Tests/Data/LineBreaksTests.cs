using System.Text;
using CellCheck.IO.Data;

namespace CellCheck.IO.Tests.Data;

public sealed class LineBreaksTests
{
    [Theory]
    [InlineData("a\nb\r\nc\rd", 3)]
    [InlineData("\r\r\n\n\r", 4)]
    [InlineData("0123456789abcdef\r\n0123456789abcdef\r\r\n\n", 4)]
    [InlineData("", 0)]
    public void Cr_lf_a_lone_cr_and_a_lone_lf_each_end_one_line(string text, long breaks)
    {
        var ended = false;
        Assert.Equal(breaks, LineBreaks.Count(Encoding.UTF8.GetBytes(text), ref ended));
    }

    [Fact]
    public void A_cr_lf_cut_between_two_calls_is_one_break()
    {
        var ended = false;
        var first = LineBreaks.Count("x\r"u8, ref ended);
        Assert.True(ended);
        Assert.Equal(1, first + LineBreaks.Count("\ny"u8, ref ended));
        Assert.False(ended);
    }
}
