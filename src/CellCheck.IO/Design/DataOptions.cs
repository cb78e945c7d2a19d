namespace CellCheck.IO.Design;

/// <summary>
/// How to read the data file: delimiter (null: detected from the header among comma, semicolon and tab), decimal
/// separator, declared thousands separator (null: refused), the texts that mean "no value", the spreadsheet sheet
/// (name or 1-based index; null: the first) and header row (1-based), and the row filter.
/// </summary>
public sealed record DataOptions(char? Delimiter, char Decimal, char? Thousands, IReadOnlyList<string> Missing, string? Sheet, int HeaderRow, WhereClause Where)
{
    public static DataOptions Default { get; } = new(null, '.', null, ["NA", ""], null, 1, WhereClause.None);
}
