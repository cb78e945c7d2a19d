using CellCheck.Core.Problems;
using CellCheck.IO.Design;
using nietras.SeparatedValues;

namespace CellCheck.IO.Data;

/// <summary>Finds the data columns a design names in the header; a missing column is a problem located in the design file.</summary>
internal sealed record ColumnMap(int[] Factors, int[] Responses, int? RunOrder, List<Problem> Problems)
{
    /// <summary><c>run_order: file</c> states that the rows are in run order.</summary>
    public const string FileOrderKeyword = "file";

    public static ColumnMap Resolve(DesignFile design, SepReaderHeader header)
    {
        var problems = new List<Problem>();
        int Find(ColumnSpec spec)
        {
            if (header.TryIndexOf(spec.Column, out var index))
            {
                return index;
            }

            var near = Suggest.Closest(spec.Column, header.ColNames);
            var shown = string.Join(", ", header.ColNames.Take(12)) + (header.ColNames.Count > 12 ? ", ..." : string.Empty);
            problems.Add(new Problem(ProblemCodes.MissingColumn, design.Path, spec.Mark.Line, spec.Mark.Column,
                $"The column '{spec.Column}' is not in the header of {design.DataText} (columns: {shown}).",
                near is null ? "Write the column name exactly as in the data file's first line." : $"Did you mean '{near}'?")
            { ColumnName = spec.Column });
            return -1;
        }

        var factors = design.Factors.Concat(design.Blocks).Select(Find).ToArray();
        var responses = design.Responses.Select(Find).ToArray();
        int? runOrder = design.RunOrder is { } ro && ro.Column != FileOrderKeyword ? Find(ro) : null;
        return new ColumnMap(factors, responses, runOrder, problems);
    }
}
