namespace CellCheck.Cli.Tests;

/// <summary>Runs the command line in-process and captures what it prints.</summary>
internal static class CliRunner
{
    public static string RepoRoot { get; } = FindRoot();

    public static (int Code, string Out, string Err) Run(params string[] args)
    {
        using var output = new StringWriter();
        using var error = new StringWriter();
        var code = Program.Run(args, output, error);
        return (code, output.ToString(), error.ToString());
    }

    public static string Design(string name) => Path.Combine(RepoRoot, "designs", name);

    /// <summary>Replaces the machine-specific repository path by "." so outputs compare across machines.</summary>
    public static string Portable(string text) => text.Replace(RepoRoot + Path.DirectorySeparatorChar, "./", StringComparison.Ordinal);

    private static string FindRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "CellCheck.sln")))
        {
            dir = dir.Parent;
        }

        return dir?.FullName ?? throw new InvalidOperationException("CellCheck.sln not found above the test folder");
    }
}
