namespace CellCheck.IO.Design;

/// <summary>
/// A row filter: <c>where: { site: north, season: [spring, summer] }</c> keeps the rows whose column equals the value
/// (or one of the listed values), all conditions together. Values compare as written in the data file (text,
/// trimmed). Rows left out by the filter are counted in the report, not listed as excluded.
/// </summary>
public sealed record WhereClause(IReadOnlyList<WhereCondition> Conditions)
{
    public static WhereClause None { get; } = new([]);
}
