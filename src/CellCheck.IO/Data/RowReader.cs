using CellCheck.Core.Data;
using CellCheck.Core.Problems;
using CellCheck.IO.Design;

namespace CellCheck.IO.Data;

/// <summary>Reads the rows of an opened table into the design's columns.</summary>
internal static class RowReader
{
    public static LoadResult<DesignData> Read(DesignFile design, ITableRows table)
    {
        var path = design.DataPath;
        var columns = ColumnMap.Resolve(design, table.Header);
        if (columns.Problems.Count > 0)
        {
            return LoadResult<DesignData>.Failure(columns.Problems);
        }

        var missing = new MissingTokens(design.Options.Missing);
        var factorSpecs = design.Factors.Concat(design.Blocks).ToArray();
        var factors = factorSpecs.Select(f => new LevelInterner(f.Name)).ToArray();
        var responses = design.Responses.Select(r => new ResponseBuilder(r.Name, r.Unit, missing, table.Numbers)).ToArray();
        var runOrder = columns.RunOrder is null ? null : new RunOrderBuilder(design.RunOrder!.Column, path, missing, table.Numbers);
        var where = design.Options.Where.Conditions;
        var lines = new ColumnBuffer<int>();
        var filtered = 0;
        while (table.Next())
        {
            var line = table.Line;
            if (!Keep(table, columns.Where, where))
            {
                filtered++;
                continue;
            }

            lines.Add(line);
            if (columns.RunOrder is { } ro)
            {
                runOrder!.Add(table.Cell(ro), line);
            }

            string? missingFactor = null;
            for (var f = 0; f < factors.Length; f++)
            {
                var text = table.Cell(columns.Factors[f]);
                var isMissing = missing.IsMissing(text);
                factors[f].Add(isMissing ? [] : text);
                missingFactor ??= isMissing ? factorSpecs[f].Name : null;
            }

            for (var r = 0; r < responses.Length; r++)
            {
                if (missingFactor is not null)
                {
                    responses[r].Exclude(line, "missing-factor", $"missing value for {missingFactor}");
                }
                else
                {
                    responses[r].Add(table.Cell(columns.Responses[r]), line);
                }
            }
        }

        if (table.Fault is { } fault)
        {
            return LoadResult<DesignData>.Failure(fault);
        }

        return Finish(design, table, columns, factors, responses, runOrder, lines, filtered);
    }

    private static bool Keep(ITableRows table, int[] columns, IReadOnlyList<WhereCondition> where)
    {
        for (var c = 0; c < where.Count; c++)
        {
            var text = table.Cell(columns[c]);
            var match = false;
            foreach (var value in where[c].Values)
            {
                match |= text.SequenceEqual(value.AsSpan().Trim());
            }

            if (!match)
            {
                return false;
            }
        }

        return true;
    }

    private static LoadResult<DesignData> Finish(DesignFile design, ITableRows table, ColumnMap columns, LevelInterner[] factors,
        ResponseBuilder[] responses, RunOrderBuilder? runOrder, ColumnBuffer<int> lines, int filtered)
    {
        var path = design.DataPath;
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

        var sourceLines = lines.Detach();
        var built = factors.Select((f, i) => f.Build(i < design.Factors.Count && design.Factors[i].Kind == FactorKind.Numeric, table.Numbers)).ToArray();
        var data = new DesignData(
            built[..design.Factors.Count],
            responses.Select(r => r.Build()).ToArray(),
            sourceLines,
            responses.Select(r => r.Excluded).ToArray(),
            built[design.Factors.Count..])
        {
            RunOrder = design.RunOrder is null ? null : runOrder?.Build() ?? Array.ConvertAll(sourceLines, l => (double)l),
            RunOrderColumn = design.RunOrder?.Column,
            FilteredOut = filtered,
        };
        var duplicate = RunOrderDuplicates.Find(design, data);
        return duplicate is null ? LoadResult<DesignData>.Success(data) : LoadResult<DesignData>.Failure(duplicate);
    }
}
