namespace CellCheck.IO.Data;

/// <summary>
/// Where a delimited text file is cut into two ranges of rows that can be read at once: just after the first line feed
/// at or past the middle of the file. Only a file without any quote character is cut (a quoted field may hold a line
/// break, so a line would not be sure to start a row), and only a UTF-8 one (the encoding check reports others).
/// </summary>
/// <param name="Header">The file's first line (the header) and a line feed, to put before the second range.</param>
/// <param name="Start">The byte offset where the second range starts.</param>
/// <param name="FirstLine">The file line the second range starts on.</param>
/// <param name="SecondLines">The lines of the second range (a last line without a break counted): with the first
/// range's <c>FirstLine − 2</c> data lines, at least as many as the rows either range can hold.</param>
internal sealed record SplitPlan(byte[] Header, long Start, int FirstLine, long SecondLines)
{
    /// <summary>Data lines of the first range (every line after the header and before <see cref="FirstLine"/>).</summary>
    public int FirstLines => FirstLine - 2;

    private const int ChunkBytes = 1 << 20;

    /// <summary>The cut of the file at <paramref name="path"/>, or null when it is not above <paramref name="minimumBytes"/>
    /// or cannot be cut (quotes, no line feed after the middle, a header line longer than a megabyte, not UTF-8).</summary>
    public static SplitPlan? Find(string path, long minimumBytes)
    {
        using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1, FileOptions.SequentialScan);
        var length = stream.Length;
        if (length <= minimumBytes)
        {
            return null;
        }

        var buffer = new byte[ChunkBytes];
        byte[]? header = null;
        var start = -1L;
        var breaks = 0L;
        var secondBreaks = 0L;
        var endsWithCr = false;
        var secondEndsWithCr = false;
        var last = (byte)0;
        for (long at = 0; at < length;)
        {
            var read = stream.ReadAtLeast(buffer, buffer.Length, throwOnEndOfStream: false);
            if (read == 0)
            {
                return null;
            }

            var chunk = buffer.AsSpan(0, read);
            if (chunk.Contains((byte)'"') || (header ??= HeaderLine(chunk)) is not { Length: > 0 })
            {
                return null;
            }

            if (start < 0 && at + read > length / 2)
            {
                var from = (int)Math.Max(0, Math.Max(length / 2, header.Length + 1) - at); // past the header's break, CR LF or not
                var feed = from < read ? chunk[from..].IndexOf((byte)'\n') : -1;
                start = feed < 0 ? -1 : at + from + feed + 1;
            }

            var counted = start < 0 ? read : (int)Math.Clamp(start - at, 0, read);
            breaks += LineBreaks.Count(chunk[..counted], ref endsWithCr);
            secondBreaks += start < 0 ? 0 : LineBreaks.Count(chunk[counted..], ref secondEndsWithCr);
            last = chunk[^1];
            at += read;
        }

        var secondLines = secondBreaks + (last is (byte)'\n' or (byte)'\r' ? 0 : 1);
        return start > 0 && start < length && breaks < int.MaxValue ? new SplitPlan(header!, start, (int)breaks + 1, secondLines) : null;
    }

    /// <summary>The header line ended by a line feed (whatever break it has in the file: a lone CR would join a line feed
    /// that starts the second range into one break), from the file's first bytes; empty when it cannot be taken.</summary>
    private static byte[] HeaderLine(ReadOnlySpan<byte> head)
    {
        var unicodeMark = head.Length >= 2 && (head[0] is 0xFF or 0xFE || head[0] == 0);
        var end = head.IndexOfAny((byte)'\r', (byte)'\n');
        return unicodeMark || end < 0 || end + 1 >= head.Length ? [] : [.. head[..end], (byte)'\n'];
    }
}
