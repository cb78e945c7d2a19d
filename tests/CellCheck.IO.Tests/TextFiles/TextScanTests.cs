using System.Text;
using CellCheck.IO.TextFiles;

namespace CellCheck.IO.Tests.TextFiles;

public sealed class TextScanTests
{
    private static TextFault? Scan(byte[] bytes, long? max = null) => TextScan.Scan(new MemoryStream(bytes), max);

    [Fact]
    public void Valid_utf8_of_every_length_passes()
    {
        // 1- to 4-byte forms: A, e-acute, euro sign, and a character outside the basic plane (RFC 3629 table).
        Assert.Null(Scan(Encoding.UTF8.GetBytes("A,\u00e9,\u20ac,\U0001F600\n")));
    }

    [Theory]
    [InlineData(new byte[] { 0x61, 0x0A, 0x62, 0x0A, 0xE9 }, 3, 1)]             // LF lines, then a Latin-1 byte
    [InlineData(new byte[] { 0x61, 0x0D, 0x0A, 0x62, 0x0D, 0xE9 }, 3, 1)]       // CRLF counts once, a lone CR counts
    [InlineData(new byte[] { 0xC3, 0xA9, 0x61, 0xE9 }, 1, 3)]                   // columns count characters, not bytes
    [InlineData(new byte[] { 0x61, 0xC0, 0xAF }, 1, 2)]                         // overlong form
    [InlineData(new byte[] { 0xED, 0xA0, 0x80 }, 1, 1)]                         // encoded surrogate
    [InlineData(new byte[] { 0xF4, 0x90, 0x80, 0x80 }, 1, 1)]                   // above U+10FFFF
    [InlineData(new byte[] { 0x61, 0x62, 0xE2, 0x82 }, 1, 3)]                   // cut short by the end of the file
    [InlineData(new byte[] { 0xE2, 0x0A, 0x82, 0xAC }, 1, 1)]                   // a line break inside a sequence
    public void Invalid_utf8_is_located_at_the_start_of_its_sequence(byte[] bytes, int line, int column)
    {
        var fault = Scan(bytes)!;
        Assert.Equal((TextFaultKind.Encoding, line, column), (fault.Kind, fault.Line, fault.Column));
    }

    [Fact]
    public void A_sequence_split_across_read_buffers_is_valid()
    {
        // The scanner reads 64 KiB at a time: put a 3-byte character across the first boundary.
        var bytes = Encoding.UTF8.GetBytes(new string('a', (1 << 16) - 1) + "\u20ac\n");
        Assert.Null(Scan(bytes));
    }

    [Fact]
    public void A_nul_byte_marks_a_binary_file()
    {
        var fault = Scan([0x61, 0x0A, 0x62, 0x63, 0x00])!;
        Assert.Equal((TextFaultKind.NotText, 2, 3), (fault.Kind, fault.Line, fault.Column));
    }

    [Fact]
    public void A_utf8_byte_order_mark_is_skipped_and_a_utf16_one_is_an_encoding_fault()
    {
        Assert.Null(Scan([0xEF, 0xBB, 0xBF, 0x61]));
        Assert.Equal(TextFaultKind.Encoding, Scan([0xFF, 0xFE, 0x61, 0x00])!.Kind);
        Assert.Equal(TextFaultKind.Encoding, Scan([0xFE, 0xFF, 0x00, 0x61])!.Kind);
    }

    [Fact]
    public void A_line_over_the_limit_is_located_and_a_line_at_the_limit_is_not()
    {
        Assert.Null(Scan(Encoding.ASCII.GetBytes("abc\n12345\r\nxy"), max: 5));
        var fault = Scan(Encoding.ASCII.GetBytes("abc\r\n123456\n"), max: 5)!;
        Assert.Equal((TextFaultKind.LineTooLong, 2, (int?)null), (fault.Kind, fault.Line, fault.Column));
    }

    [Fact]
    public void Faults_after_read_buffers_of_lf_lines_are_located_exactly()
    {
        // 64 KiB buffers of LF lines are taken at once: the fault's line and column must be those of a byte-by-byte count
        var text = new StringBuilder();
        for (var i = 0; i < 20_000; i++)
        {
            text.Append(i).Append(",x,").Append(i % 7).Append('\n');
        }

        var lines = 20_000;
        text.Append("ab");
        var bytes = Encoding.ASCII.GetBytes(text.ToString()).Append((byte)0xE9).ToArray();
        var fault = Scan(bytes)!;
        Assert.Equal((TextFaultKind.Encoding, lines + 1, 3), (fault.Kind, fault.Line, fault.Column));
        var nul = Scan(Encoding.ASCII.GetBytes(text.ToString()).Append((byte)0).ToArray())!;
        Assert.Equal((TextFaultKind.NotText, lines + 1, 3), (nul.Kind, nul.Line, nul.Column));
    }

    [Fact]
    public void A_line_over_the_limit_across_read_buffers_is_found_and_one_at_the_limit_is_not()
    {
        var head = string.Concat(Enumerable.Repeat("a,b\n", 30_000)); // 120 000 bytes of short lines first
        Assert.Null(Scan(Encoding.ASCII.GetBytes(head + new string('z', 100_000) + "\nq\n"), max: 100_000));
        var fault = Scan(Encoding.ASCII.GetBytes(head + new string('z', 100_001) + "\nq\n"), max: 100_000)!;
        Assert.Equal((TextFaultKind.LineTooLong, 30_001, (int?)null), (fault.Kind, fault.Line, fault.Column));
    }

    [Fact]
    public void A_crlf_split_across_read_buffers_counts_once_after_lf_lines()
    {
        // the CR is the last byte of the first 64 KiB buffer, its LF the first of the next
        var first = new string('a', (1 << 16) - 3) + "\nb\r";
        var bytes = Encoding.ASCII.GetBytes(first + "\nc\n").Append((byte)0xE9).ToArray();
        var fault = Scan(bytes)!;
        Assert.Equal((TextFaultKind.Encoding, 4, 1), (fault.Kind, fault.Line, fault.Column));
    }
}
