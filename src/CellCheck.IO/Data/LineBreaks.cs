using System.Numerics;
using System.Runtime.Intrinsics;

namespace CellCheck.IO.Data;

/// <summary>Counts line breaks in UTF-8 bytes the way the delimited-text reader numbers lines: CR LF, a lone CR and a
/// lone LF each end one line.</summary>
internal static class LineBreaks
{
    /// <summary>The line breaks in <paramref name="bytes"/>, given whether the bytes before them ended with a CR (then a
    /// first LF completes that CR's break); <paramref name="endsWithCr"/> is updated for the next call.</summary>
    public static long Count(ReadOnlySpan<byte> bytes, ref bool endsWithCr)
    {
        if (bytes.IsEmpty)
        {
            return 0;
        }

        long breaks = bytes.Count((byte)'\n');
        var returns = bytes.Count((byte)'\r');
        breaks += returns - (returns > 0 ? CrLfPairs(bytes) : 0) - (endsWithCr && bytes[0] == '\n' ? 1 : 0);
        endsWithCr = bytes[^1] == '\r';
        return breaks;
    }

    /// <summary>The CR LF pairs within <paramref name="bytes"/>.</summary>
    private static int CrLfPairs(ReadOnlySpan<byte> bytes)
    {
        var count = 0;
        var i = 0;
        if (Vector128.IsHardwareAccelerated)
        {
            var cr = Vector128.Create((byte)'\r');
            var lf = Vector128.Create((byte)'\n');
            for (; i + Vector128<byte>.Count < bytes.Length; i += Vector128<byte>.Count)
            {
                var pairs = Vector128.Equals(Vector128.Create(bytes.Slice(i, Vector128<byte>.Count)), cr)
                    & Vector128.Equals(Vector128.Create(bytes.Slice(i + 1, Vector128<byte>.Count)), lf);
                count += BitOperations.PopCount(pairs.ExtractMostSignificantBits());
            }
        }

        for (; i + 1 < bytes.Length; i++)
        {
            count += bytes[i] == '\r' && bytes[i + 1] == '\n' ? 1 : 0;
        }

        return count;
    }
}
