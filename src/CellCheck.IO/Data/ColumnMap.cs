using CellCheck.Core.Problems;
using CellCheck.IO.Design;

namespace CellCheck.IO.Data;

/// <summary>Finds the data columns a design names (and its filter's columns) in the header; a missing column is a
/// problem located in the design file.</summary>
internal sealed record ColumnMap(int[] Factors, int[] Responses, int? RunOrder, int[] Where, List<Problem> Problems)
{
    /// <summary><c>run_order: file</c> states that the rows are in run order.</summary>
    public const string FileOrderKeyword = "file";

    public static ColumnMap Resolve(DesignFile design, IReadOnlyList<string> header)
    {
        var problems = new List<Problem>();
        int Find(string column, SourceMark mark)
        {
            for (var i = 0; i < header.Count; i++)
            {
                if (string.Equals(header[i], column, StringComparison.Ordinal))
                {
                    return i;
                }
            }

            var near = Suggest.Closest(column, header);
            var shown = string.Join(", ", header.Take(12).Select(h => h.Length <= 40 ? h : h[..37] + "...")) + (header.Count > 12 ? ", ..." : string.Empty);
            problems.Add(new Problem(ProblemCodes.MissingColumn, design.Path, mark.Line, mark.Column,
                $"The column '{column}' is not in the header of {design.DataText} (columns: {shown}).",
                near is null ? "Write the column name exactly as in the data file's header." : $"Did you mean '{near}'?")
            { ColumnName = column });
            return -1;
        }

        var factors = design.Factors.Concat(design.Blocks).Select(s => Find(s.Column, s.Mark)).ToArray();
        var responses = design.Responses.Select(s => Find(s.Column, s.Mark)).ToArray();
        int? runOrder = design.RunOrder is { } ro && ro.Column != FileOrderKeyword ? Find(ro.Column, ro.Mark) : null;
        var where = design.Options.Where.Conditions.Select(c => Find(c.Column, c.Mark)).ToArray();
        return new ColumnMap(factors, responses, runOrder, where, problems);
    }
}
