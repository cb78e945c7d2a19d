using System.Buffers.Binary;

namespace CellCheck.IO.Plots;

/// <summary>Records a PNG's resolution: a pHYs chunk (pixels per metre, PNG specification §11.3.5.3) after IHDR.</summary>
internal static class PngDensity
{
    public static byte[] WithDpi(byte[] png, int dpi)
    {
        ArgumentNullException.ThrowIfNull(png);
        const int signature = 8;
        var ihdrLength = BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(signature));
        var afterIhdr = signature + 4 + 4 + ihdrLength + 4;
        var perMetre = (uint)Math.Round(dpi / 0.0254);
        var chunk = new byte[4 + 4 + 9 + 4];
        BinaryPrimitives.WriteInt32BigEndian(chunk, 9);
        "pHYs"u8.CopyTo(chunk.AsSpan(4));
        BinaryPrimitives.WriteUInt32BigEndian(chunk.AsSpan(8), perMetre);
        BinaryPrimitives.WriteUInt32BigEndian(chunk.AsSpan(12), perMetre);
        chunk[16] = 1; // unit: metre
        BinaryPrimitives.WriteUInt32BigEndian(chunk.AsSpan(17), Crc(chunk.AsSpan(4, 4 + 9)));
        return [.. png.AsSpan(0, afterIhdr), .. chunk, .. png.AsSpan(afterIhdr)];
    }

    /// <summary>The CRC-32 of the PNG specification (ISO 3309, reflected polynomial 0xEDB88320).</summary>
    internal static uint Crc(ReadOnlySpan<byte> bytes)
    {
        var crc = 0xFFFFFFFFu;
        foreach (var b in bytes)
        {
            crc ^= b;
            for (var k = 0; k < 8; k++)
            {
                crc = (crc & 1) != 0 ? 0xEDB88320u ^ (crc >> 1) : crc >> 1;
            }
        }

        return crc ^ 0xFFFFFFFFu;
    }
}
