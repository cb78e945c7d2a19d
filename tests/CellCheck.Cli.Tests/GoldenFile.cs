namespace CellCheck.Cli.Tests;

/// <summary>
/// Compares output with a golden file under tests/CellCheck.Cli.Tests/Golden. Set CELLCHECK_UPDATE_GOLDEN=1 to
/// rewrite the golden files after an intended change, then review the diff before committing.
/// </summary>
internal static class GoldenFile
{
    public static void Match(string name, string actual)
    {
        var path = Path.Combine(CliRunner.RepoRoot, "tests", "CellCheck.Cli.Tests", "Golden", name);
        actual = actual.Replace("\r\n", "\n", StringComparison.Ordinal);
        if (Environment.GetEnvironmentVariable("CELLCHECK_UPDATE_GOLDEN") == "1")
        {
            File.WriteAllText(path, actual);
        }

        Assert.True(File.Exists(path), $"golden file {name} is missing; run with CELLCHECK_UPDATE_GOLDEN=1 to create it");
        Assert.Equal(File.ReadAllText(path), actual);
    }
}
