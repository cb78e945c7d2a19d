namespace CellCheck.Core.Cells;

/// <summary>
/// How the rows of one response fill the factorial space: observed cells, combinations of the full factorial
/// with no rows (listed up to <see cref="CensusBuilder.EmptyListLimit"/>), singleton cells, replicate counts and balance.
/// </summary>
public sealed record Census(
    int Cells,
    double Combinations,
    int EmptyCount,
    IReadOnlyList<IReadOnlyList<string>> Empty,
    int Singletons,
    int MinReplicates,
    int MaxReplicates,
    bool Balanced,
    int Rows)
{
    /// <summary>True when the empty combinations were too many to list and only counted.</summary>
    public bool EmptyListTruncated => Empty.Count < EmptyCount;
}
