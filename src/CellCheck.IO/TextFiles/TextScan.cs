using System.Globalization;

namespace CellCheck.IO.TextFiles;

/// <summary>
/// Checks, byte by byte, that a stream is UTF-8 text before it is parsed: a .NET reader would silently turn
/// Latin-1 accents into U+FFFD and read binary files as text. Finds the first invalid UTF-8 sequence (RFC 3629:
/// no overlong forms, no surrogates, nothing above U+10FFFF), the first NUL byte, and the first line longer
/// than a limit, each with its line (CR, LF and CRLF end a line, as the CSV reader counts them) and column
/// (in characters). A UTF-8 byte-order mark is skipped; a UTF-16 or UTF-32 one is an encoding fault.
/// </summary>
public static class TextScan
{
    /// <summary>Lines of a data file longer than this many bytes are refused.</summary>
    public const int MaxLineBytes = 1 << 20;

    public static TextFault? Scan(Stream stream, long? maxLineBytes)
    {
        ArgumentNullException.ThrowIfNull(stream);
        var buffer = new byte[1 << 16];
        var state = new ScanState(maxLineBytes ?? long.MaxValue);
        var first = true;
        int read;
        while ((read = stream.Read(buffer, 0, buffer.Length)) > 0)
        {
            var start = 0;
            if (first)
            {
                first = false;
                if (StartsWithUtf16Mark(buffer.AsSpan(0, read)))
                {
                    return new TextFault(TextFaultKind.Encoding, 1, 1, "the file is UTF-16 or UTF-32 text (it starts with such a byte-order mark)");
                }

                start = read >= 3 && buffer[0] == 0xEF && buffer[1] == 0xBB && buffer[2] == 0xBF ? 3 : 0;
            }

            if (state.Run(buffer.AsSpan(start, read - start)) is { } fault)
            {
                return fault;
            }
        }

        return state.End();
    }

    private static bool StartsWithUtf16Mark(ReadOnlySpan<byte> head) =>
        head.Length >= 2 && ((head[0] == 0xFF && head[1] == 0xFE) || (head[0] == 0xFE && head[1] == 0xFF))
        || (head.Length >= 4 && head[0] == 0 && head[1] == 0 && head[2] == 0xFE && head[3] == 0xFF);

    internal static string Hex(byte b) => "0x" + b.ToString("X2", CultureInfo.InvariantCulture);
}
