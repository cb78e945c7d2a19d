using System.Globalization;
using System.Security.Cryptography;

namespace CellCheck.Fuzz;

/// <summary>Keeps each crashing input once per distinct failure (exception type and throwing frame), as
/// <c>TARGET-HASH.bin</c> with the exception beside it in <c>.txt</c>.</summary>
internal sealed class CrashLog(string folder)
{
    private readonly HashSet<string> _kinds = new(StringComparer.Ordinal);

    public int Total { get; private set; }

    public int Unique => _kinds.Count;

    public void Add(string target, byte[] input, Exception ex)
    {
        Total++;
        var frame = ex.StackTrace?.Split('\n').FirstOrDefault(l => l.Contains("CellCheck", StringComparison.Ordinal))?.Trim()
            ?? ex.StackTrace?.Split('\n').FirstOrDefault()?.Trim() ?? "?";
        if (!_kinds.Add(target + " " + ex.GetType().FullName + " " + frame))
        {
            return;
        }

        Directory.CreateDirectory(folder);
        var name = target + "-" + Convert.ToHexStringLower(SHA256.HashData(input))[..12];
        File.WriteAllBytes(Path.Combine(folder, name + ".bin"), input);
        File.WriteAllText(Path.Combine(folder, name + ".txt"), ex.ToString());
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  crash {name}: {ex.GetType().Name}: {ex.Message.Split('\n')[0]}"));
    }
}
