using System.Text.RegularExpressions;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Conventions;

/// <summary>Core is pure computation: no files, console, clock, culture or randomness of its own; only the BCL and MathNet.Numerics.</summary>
public sealed partial class CorePurityTests
{
    [Fact]
    public void Core_references_only_the_base_library_and_mathnet()
    {
        var names = typeof(ShapiroWilk).Assembly.GetReferencedAssemblies().Select(a => a.Name!).ToList();
        Assert.All(names, n => Assert.True(n == "MathNet.Numerics" || n == "netstandard" || n.StartsWith("System", StringComparison.Ordinal), n));
        Assert.DoesNotContain("System.Console", names);
    }

    [Fact]
    public void Core_source_uses_no_files_console_clock_environment_or_current_culture()
    {
        var root = FindRepoRoot();
        var offenders = Directory.EnumerateFiles(Path.Combine(root, "src", "CellCheck.Core"), "*.cs", SearchOption.AllDirectories)
            .Where(f => !f.Contains($"{Path.DirectorySeparatorChar}obj{Path.DirectorySeparatorChar}", StringComparison.Ordinal))
            .SelectMany(f => File.ReadLines(f).Select((line, i) => (f, i, line)))
            .Where(t => !t.line.TrimStart().StartsWith("///", StringComparison.Ordinal) && Forbidden().IsMatch(t.line))
            .Select(t => $"{Path.GetFileName(t.f)}:{t.i + 1}: {t.line.Trim()}")
            .ToList();
        Assert.Empty(offenders);
    }

    [GeneratedRegex(@"\bSystem\.IO\b|\bFile\.|\bDirectory\.|\bConsole\.|\bDateTime(Offset)?\.(Now|UtcNow|Today)\b|\bEnvironment\.|CurrentCulture|CurrentUICulture|\bStopwatch\b|\bGuid\.NewGuid\b|new Random\(|Random\.Shared")]
    private static partial Regex Forbidden();

    internal static string FindRepoRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "CellCheck.sln")))
        {
            dir = dir.Parent;
        }

        return dir?.FullName ?? throw new InvalidOperationException("CellCheck.sln not found");
    }
}
