using CellCheck.Core.Problems;

namespace CellCheck.Cli;

/// <summary>Prints located problems for a person: where, what is wrong, how to fix it.</summary>
internal static class ProblemPrinter
{
    /// <summary>At most this many problems are printed (a hostile file can hold thousands); the count says how many more.</summary>
    public const int Shown = 50;

    public static int Print(IReadOnlyList<Problem> problems, TextWriter error)
    {
        foreach (var p in problems.Take(Shown))
        {
            error.WriteLine($"error [{p.Code}] {p.Location}");
            error.WriteLine($"  {p.What}");
            error.WriteLine($"  fix: {p.Fix}");
        }

        if (problems.Count > Shown)
        {
            error.WriteLine($"... and {problems.Count - Shown} more problems not shown.");
        }

        error.WriteLine(problems.Count == 1 ? "1 problem; nothing was checked." : $"{problems.Count} problems; nothing was checked.");
        return ExitCodes.BadInput;
    }
}
