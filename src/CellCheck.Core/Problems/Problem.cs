namespace CellCheck.Core.Problems;

/// <summary>
/// A located problem with the user's input: a stable <see cref="Code"/> (see the error catalogue in the README),
/// the file it is in, where (line and column of a design file, or line and column name of a data file),
/// what is wrong and how to fix it. Problems are returned, never thrown.
/// </summary>
public sealed record Problem(string Code, string File, int? Line, int? Column, string What, string Fix)
{
    /// <summary>Optional name of the data column the problem concerns.</summary>
    public string? ColumnName { get; init; }

    /// <summary>"file:line:column" (parts omitted when unknown), for messages.</summary>
    public string Location
    {
        get
        {
            var where = File;
            if (Line is { } line)
            {
                where += ":" + line.ToString(System.Globalization.CultureInfo.InvariantCulture);
                if (Column is { } col)
                {
                    where += ":" + col.ToString(System.Globalization.CultureInfo.InvariantCulture);
                }
            }

            return where;
        }
    }
}
