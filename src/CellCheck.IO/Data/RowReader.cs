using CellCheck.Core.Data;
using CellCheck.Core.Problems;
using CellCheck.IO.Design;

namespace CellCheck.IO.Data;

/// <summary>Reads the rows of an opened table into the design's columns.</summary>
internal static class RowReader
{
    public static LoadResult<DesignData> Read(DesignFile design, ITableRows table)
    {
        var columns = ColumnMap.Resolve(design, table.Header);
        if (columns.Problems.Count > 0)
        {
            return LoadResult<DesignData>.Failure(columns.Problems);
        }

        var set = new ColumnSet(design, columns, table.Numbers);
        while (table.Next())
        {
            set.Take(table);
        }

        return table.Fault is { } fault ? LoadResult<DesignData>.Failure(fault) : Finish(design, table, columns, set);
    }

    /// <summary>The design's data from the columns read (or the first problem they show).</summary>
    public static LoadResult<DesignData> Finish(DesignFile design, ITableRows table, ColumnMap columns, ColumnSet set)
    {
        var path = design.DataPath;
        var (factors, responses, runOrder, lines, filtered) = (set.Factors, set.Responses, set.RunOrder, set.Lines, set.Filtered);
        for (var r = 0; r < responses.Length; r++)
        {
            if (responses[r].Grouping is { } g)
            {
                return LoadResult<DesignData>.Failure(new Problem(ProblemCodes.ThousandsSeparator, path, g.Line, columns.Responses[r] + 1,
                    $"'{g.Text}' at {table.Locate(g.Line, columns.Responses[r])} seems to use a thousands separator, which is not declared.",
                    "Remove the grouping from the numbers, or declare it, for example thousands: \",\" (with decimal: \".\").") { ColumnName = design.Responses[r].Column });
            }
        }

        if (lines.Count == 0)
        {
            return LoadResult<DesignData>.Failure(filtered > 0
                ? new Problem(ProblemCodes.NoRowsLeft, design.Path, design.Options.Where.Conditions[0].Mark.Line, design.Options.Where.Conditions[0].Mark.Column,
                    $"The where filter leaves no rows (all {filtered} rows are filtered out).", "Check the filter's values against the data file.")
                : new Problem(ProblemCodes.DataNoRows, path, 2, null, "The data file has a header but no data rows.", "Add one line per run below the header."));
        }

        if (runOrder?.Problem is { } orderProblem)
        {
            return LoadResult<DesignData>.Failure(orderProblem);
        }

        var numericProblems = NumericLevels.Check(design, factors, table.Numbers);
        if (numericProblems.Count > 0)
        {
            return LoadResult<DesignData>.Failure(numericProblems);
        }

        // every column is finished on its own (levels put in order and codes renumbered, chunks joined): side by side
        LineNumbers sourceLines = null!;
        RunPositions? order = null;
        var built = new FactorColumn[factors.Length];
        var values = new ResponseColumn[responses.Length];
        var work = new List<Action> { () => sourceLines = lines.Build() };
        for (var i = 0; i < factors.Length; i++)
        {
            var f = i;
            work.Add(() => built[f] = factors[f].Build(f < design.Factors.Count && design.Factors[f].Kind == FactorKind.Numeric, table.Numbers));
        }

        for (var i = 0; i < responses.Length; i++)
        {
            var r = i;
            work.Add(() => values[r] = responses[r].Build());
        }

        if (design.RunOrder is not null && runOrder is not null)
        {
            work.Add(() => order = runOrder.Build());
        }

        Parallel.Invoke([.. work]);
        var data = new DesignData(
            built[..design.Factors.Count],
            values,
            sourceLines,
            responses.Select(r => r.Excluded).ToArray(),
            built[design.Factors.Count..])
        {
            RunOrder = design.RunOrder is null ? null : order ?? FileOrder(sourceLines),
            RunOrderColumn = design.RunOrder?.Column,
            FilteredOut = filtered,
        };
        var duplicate = RunOrderDuplicates.Find(design, data);
        return duplicate is null ? LoadResult<DesignData>.Success(data) : LoadResult<DesignData>.Failure(duplicate);
    }

    /// <summary>The data-file lines as run positions (run_order: file): consecutive lines are counted, not stored.</summary>
    private static RunPositions FileOrder(LineNumbers lines) =>
        lines.IsConsecutive ? RunPositions.Consecutive(lines[0], lines.Length) : RunPositions.From(Array.ConvertAll(lines.ToArray(), l => (double)l));
}
