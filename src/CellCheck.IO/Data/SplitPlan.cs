namespace CellCheck.IO.Data;

/// <summary>
/// Where a delimited text file is cut into ranges of rows that can be read at once: each cut just after the first line
/// feed at or past an equal share of the file's bytes (and past the header and the cut before). Only a file without
/// any quote character is cut (a quoted field may hold a line break, so a line would not be sure to start a row), and
/// only a UTF-8 one (the encoding check reports others).
/// </summary>
/// <param name="Header">The file's first line (the header) and a line feed, to put before every range after the first.</param>
/// <param name="Starts">The byte offset where each range starts (the first range's 0: it is read with the header).</param>
/// <param name="FirstLines">The file line each range starts on (the first range's is line 2).</param>
/// <param name="Lines">The lines of each range (the last range's last line without a break counted): at least as many
/// as the rows the range can hold.</param>
internal sealed record SplitPlan(byte[] Header, long[] Starts, int[] FirstLines, long[] Lines)
{
    private const int ChunkBytes = 1 << 20;

    /// <summary>The number of ranges (at least two).</summary>
    public int Count => Starts.Length;

    /// <summary>The cut of the file at <paramref name="path"/> into at most <paramref name="parts"/> ranges, or null when
    /// it is not above <paramref name="minimumBytes"/> or cannot be cut in two at least (quotes, no line feed after the
    /// first share, a header line longer than a megabyte, not UTF-8). Ranges are fewer when lines are longer than a share.</summary>
    public static SplitPlan? Find(string path, long minimumBytes, int parts = 2)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(parts, 2);
        using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1, FileOptions.SequentialScan);
        var length = stream.Length;
        if (length <= minimumBytes)
        {
            return null;
        }

        var buffer = new byte[ChunkBytes];
        byte[]? header = null;
        var cuts = new List<(long Start, long BreaksBefore)>();
        var breaks = 0L;
        var endsWithCr = false;
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

            // the cuts that fall in this chunk, each counted up to: the line breaks before a cut number its first line
            var counted = 0;
            while (cuts.Count < parts - 1)
            {
                // past the header's break (CR LF or not) and at or past the cut before
                var target = Math.Max(Math.Max(length / parts * (cuts.Count + 1), header.Length + 1), cuts.Count > 0 ? cuts[^1].Start : 0);
                var from = (int)Math.Max(counted, target - at);
                var feed = from < read ? chunk[from..].IndexOf((byte)'\n') : -1;
                if (feed < 0)
                {
                    break; // the cut is further on
                }

                var start = at + from + feed + 1;
                breaks += LineBreaks.Count(chunk[counted..(from + feed + 1)], ref endsWithCr);
                counted = from + feed + 1;
                if (start >= length)
                {
                    parts = cuts.Count + 1; // nothing after it: no more cuts
                    break;
                }

                cuts.Add((start, breaks));
            }

            breaks += LineBreaks.Count(chunk[counted..], ref endsWithCr);
            last = chunk[^1];
            at += read;
        }

        if (cuts.Count == 0 || cuts[^1].BreaksBefore >= int.MaxValue)
        {
            return null;
        }

        var count = cuts.Count + 1;
        var starts = new long[count];
        var firstLines = new int[count];
        var lines = new long[count];
        firstLines[0] = 2;
        for (var r = 1; r < count; r++)
        {
            (starts[r], firstLines[r]) = (cuts[r - 1].Start, (int)cuts[r - 1].BreaksBefore + 1);
            lines[r - 1] = firstLines[r] - firstLines[r - 1];
        }

        lines[^1] = breaks - cuts[^1].BreaksBefore + (last is (byte)'\n' or (byte)'\r' ? 0 : 1);
        return new SplitPlan(header!, starts, firstLines, lines);
    }

    /// <summary>The header line ended by a line feed (whatever break it has in the file: a lone CR would join a line feed
    /// that starts the next range into one break), from the file's first bytes; empty when it cannot be taken.</summary>
    private static byte[] HeaderLine(ReadOnlySpan<byte> head)
    {
        var unicodeMark = head.Length >= 2 && (head[0] is 0xFF or 0xFE || head[0] == 0);
        var end = head.IndexOfAny((byte)'\r', (byte)'\n');
        return unicodeMark || end < 0 || end + 1 >= head.Length ? [] : [.. head[..end], (byte)'\n'];
    }
}
