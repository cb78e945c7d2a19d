using CellCheck.Core.Problems;

namespace CellCheck.Cli;

/// <summary>Prints located problems for a person: where, what is wrong, how to fix it.</summary>
internal static class ProblemPrinter
{
    public static int Print(IReadOnlyList<Problem> problems, TextWriter error)
    {
        foreach (var p in problems)
        {
            error.WriteLine($"error [{p.Code}] {p.Location}");
            error.WriteLine($"  {p.What}");
            error.WriteLine($"  fix: {p.Fix}");
        }

        error.WriteLine(problems.Count == 1 ? "1 problem; nothing was checked." : $"{problems.Count} problems; nothing was checked.");
        return ExitCodes.BadInput;
    }
}
