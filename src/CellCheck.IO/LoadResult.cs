using CellCheck.Core.Problems;

namespace CellCheck.IO;

/// <summary>A value read from the user's files, or the located problems that stopped it.</summary>
public sealed record LoadResult<T>(T? Value, IReadOnlyList<Problem> Problems)
    where T : class
{
    public bool Ok => Value is not null && Problems.Count == 0;

    public static LoadResult<T> Success(T value) => new(value, []);

    public static LoadResult<T> Failure(IReadOnlyList<Problem> problems) => new(null, problems);

    public static LoadResult<T> Failure(Problem problem) => new(null, [problem]);
}
