using System.Security.Cryptography;

namespace CellCheck.IO.Html;

/// <summary>The SHA-256 of a file, lower-case hex, so a report can be tied to the exact data it checked.</summary>
public static class FileDigest
{
    public static string Sha256(string path)
    {
        using var stream = File.OpenRead(path);
        return Convert.ToHexStringLower(SHA256.HashData(stream));
    }
}
