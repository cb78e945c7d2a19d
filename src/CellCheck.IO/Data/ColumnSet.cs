using CellCheck.IO.Design;

namespace CellCheck.IO.Data;

/// <summary>
/// The columns being built from the rows of a table (all of them, or one range of a file read in ranges): one
/// builder per factor, block and response, the run order, the data-file line of every kept row and the count of rows
/// the where filter leaves out.
/// </summary>
internal sealed class ColumnSet
{
    private readonly ColumnMap _columns;
    private readonly MissingTokens _missing;
    private readonly string[] _factorNames;
    private readonly IReadOnlyList<WhereCondition> _where;

    /// <param name="origins">Per response, the origin known from earlier rows (null entries, or no array, when none is).</param>
    /// <param name="reserve">Arrays to write the columns into, as the given range of a split read (or none).</param>
    public ColumnSet(DesignFile design, ColumnMap columns, NumberSyntax numbers, ResponseOrigin?[]? origins = null,
        (ColumnReserve Arrays, int Range)? reserve = null)
    {
        _columns = columns;
        _missing = new MissingTokens(design.Options.Missing);
        _factorNames = [.. design.Factors.Select(f => f.Name), .. design.Blocks.Select(b => b.Name)];
        _where = design.Options.Where.Conditions;
        ColumnBuffer<T>? Space<T>(T[]? array) => reserve is { } r && array is not null ? r.Arrays.Buffer(array, r.Range) : null;
        var space = reserve?.Arrays;
        Factors = new LevelInterner[_factorNames.Length];
        for (var f = 0; f < Factors.Length; f++)
        {
            Factors[f] = new LevelInterner(_factorNames[f], Space(space?.Factors[f]));
        }

        Responses = new ResponseBuilder[design.Responses.Count];
        for (var r = 0; r < Responses.Length; r++)
        {
            Responses[r] = new ResponseBuilder(design.Responses[r].Name, design.Responses[r].Unit, _missing, numbers, origins?[r], Space(space?.Responses[r]));
        }

        RunOrder = columns.RunOrder is null ? null : new RunOrderBuilder(design.RunOrder!.Column, design.DataPath, _missing, numbers, Space(space?.RunOrder));
        Lines = new LineRecorder(Space(space?.Lines) ?? new());
    }

    public LevelInterner[] Factors { get; }

    public ResponseBuilder[] Responses { get; }

    public RunOrderBuilder? RunOrder { get; }

    /// <summary>The data-file line of every kept row.</summary>
    public LineRecorder Lines { get; }

    /// <summary>Rows left out by the where filter.</summary>
    public int Filtered { get; private set; }

    /// <summary>True once every response has its origin.</summary>
    public bool OriginsKnown
    {
        get
        {
            foreach (var response in Responses)
            {
                if (response.Origin is null)
                {
                    return false;
                }
            }

            return true;
        }
    }

    public ResponseOrigin?[] Origins() => Array.ConvertAll(Responses, r => r.Origin);

    /// <summary>Adds the table's current row.</summary>
    public void Take(ITableRows table)
    {
        var line = table.Line;
        if (!Keep(table))
        {
            Filtered++;
            return;
        }

        Lines.Add(line);
        if (_columns.RunOrder is { } ro)
        {
            RunOrder!.Add(table.Cell(ro), line);
        }

        string? missingFactor = null;
        for (var f = 0; f < Factors.Length; f++)
        {
            var text = table.Cell(_columns.Factors[f]);
            var isMissing = _missing.IsMissing(text);
            Factors[f].Add(isMissing ? [] : text);
            missingFactor ??= isMissing ? _factorNames[f] : null;
        }

        for (var r = 0; r < Responses.Length; r++)
        {
            if (missingFactor is not null)
            {
                Responses[r].Exclude(line, "missing-factor", $"missing value for {missingFactor}");
            }
            else
            {
                Responses[r].Add(table.Cell(_columns.Responses[r]), line);
            }
        }
    }

    /// <summary>Takes over the rows of <paramref name="next"/>, which read the rows after this set's (with this set's
    /// origins): the columns are then those of one set reading all rows.</summary>
    public void Append(ColumnSet next)
    {
        for (var f = 0; f < Factors.Length; f++)
        {
            Factors[f].Append(next.Factors[f]);
        }

        for (var r = 0; r < Responses.Length; r++)
        {
            Responses[r].Append(next.Responses[r]);
        }

        RunOrder?.Append(next.RunOrder!);
        Lines.Append(next.Lines);
        Filtered += next.Filtered;
    }

    private bool Keep(ITableRows table)
    {
        for (var c = 0; c < _where.Count; c++)
        {
            var text = table.Cell(_columns.Where[c]);
            var match = false;
            foreach (var value in _where[c].Values)
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
}
