using CellCheck.Core.Data;
using CellCheck.Core.Problems;
using CellCheck.IO.Design;
using nietras.SeparatedValues;

namespace CellCheck.IO.Data;

/// <summary>
/// Reads the data file of a design (CSV or TSV, separator detected from the header; quoted fields; UTF-8 with or
/// without BOM) straight into columns. Only the columns the design names are kept. A missing factor value excludes
/// the row for every response; a missing or non-numeric response value excludes it for that response. Every
/// exclusion is kept with its line and reason.
/// </summary>
public static class DataReader
{
    public static LoadResult<DesignData> Read(DesignFile design)
    {
        ArgumentNullException.ThrowIfNull(design);
        var path = design.DataPath;
        if (Directory.Exists(path) || !File.Exists(path))
        {
            return LoadResult<DesignData>.Failure(new Problem(ProblemCodes.DataNotFound, design.Path, design.DataMark.Line, design.DataMark.Column,
                $"The data file '{design.DataText}' does not exist (looked for {path}).", "Give the data file's path relative to the design file."));
        }

        var extension = Path.GetExtension(path).ToLowerInvariant();
        if (extension is not (".csv" or ".tsv" or ".txt"))
        {
            return LoadResult<DesignData>.Failure(new Problem(ProblemCodes.DataUnsupportedFormat, design.Path, design.DataMark.Line, design.DataMark.Column,
                $"'{design.DataText}' is not a delimited text file (.csv, .tsv or .txt).", "Save the data as CSV (comma-separated, UTF-8) and name that file."));
        }

        try
        {
            using var reader = Sep.Reader(o => o with { Unescape = true }).FromFile(path);
            return ReadRows(design, reader);
        }
        catch (ArgumentException ex) when (ex.Message.Contains("found", StringComparison.Ordinal))
        {
            return LoadResult<DesignData>.Failure(new Problem(ProblemCodes.DuplicateColumn, path, 1, null,
                "The header names a column more than once: " + FirstLine(ex.Message), "Give every column of the header its own name."));
        }
        catch (IOException ex)
        {
            return LoadResult<DesignData>.Failure(new Problem(ProblemCodes.DataUnreadable, path, null, null,
                "The data file cannot be read: " + ex.Message, "Check that the file is not locked and is readable."));
        }
        catch (UnauthorizedAccessException ex)
        {
            return LoadResult<DesignData>.Failure(new Problem(ProblemCodes.DataUnreadable, path, null, null,
                "The data file cannot be read: " + ex.Message, "Check the file's permissions."));
        }
    }

    private static LoadResult<DesignData> ReadRows(DesignFile design, SepReader reader)
    {
        var path = design.DataPath;
        if (reader.Header.IsEmpty)
        {
            return LoadResult<DesignData>.Failure(new Problem(ProblemCodes.DataEmpty, path, 1, null,
                "The data file is empty.", "The first line must name the columns; each following line holds one run."));
        }

        var columns = ColumnMap.Resolve(design, reader.Header);
        if (columns.Problems.Count > 0)
        {
            return LoadResult<DesignData>.Failure(columns.Problems);
        }

        var factorSpecs = design.Factors.Concat(design.Blocks).ToArray();
        var factors = factorSpecs.Select(f => new LevelInterner(f.Name, 1024)).ToArray();
        var responses = design.Responses.Select(r => new ResponseBuilder(r.Name, r.Unit, 1024)).ToArray();
        var lines = new List<int>(1024);
        var runOrder = columns.RunOrder is null ? null : new RunOrderBuilder(design.RunOrder!.Column, path);
        var lastLine = 1;
        try
        {
            foreach (var row in reader)
            {
                lastLine = row.LineNumberToExcl;
                var line = row.LineNumberFrom;
                lines.Add(line);
                runOrder?.Add(row[columns.RunOrder!.Value].Span.Trim(), line);
                string? missingFactor = null;
                for (var f = 0; f < factors.Length; f++)
                {
                    var text = row[columns.Factors[f]].Span.Trim();
                    var missing = MissingTokens.IsMissing(text);
                    factors[f].Add(missing ? [] : text);
                    missingFactor ??= missing ? factorSpecs[f].Name : null;
                }

                for (var r = 0; r < responses.Length; r++)
                {
                    if (missingFactor is not null)
                    {
                        responses[r].Exclude(line, "missing-factor", $"missing value for {missingFactor}");
                    }
                    else
                    {
                        responses[r].Add(row[columns.Responses[r]].Span.Trim(), line);
                    }
                }
            }
        }
        catch (InvalidDataException ex)
        {
            return LoadResult<DesignData>.Failure(new Problem(ProblemCodes.RaggedRow, path, lastLine, null,
                "A row has a different number of fields than the header: " + FirstLine(ex.Message),
                "Check for a missing or extra separator on this line, or a quote that is not closed."));
        }

        if (lines.Count == 0)
        {
            return LoadResult<DesignData>.Failure(new Problem(ProblemCodes.DataNoRows, path, 2, null,
                "The data file has a header but no data rows.", "Add one line per run below the header."));
        }

        if (runOrder?.Problem is { } orderProblem)
        {
            return LoadResult<DesignData>.Failure(orderProblem);
        }

        var numericProblems = NumericLevels.Check(design, factors);
        if (numericProblems.Count > 0)
        {
            return LoadResult<DesignData>.Failure(numericProblems);
        }

        var built = factors.Select((f, i) => f.Build(i < design.Factors.Count && design.Factors[i].Kind == FactorKind.Numeric)).ToArray();
        var data = new DesignData(
            built[..design.Factors.Count],
            responses.Select(r => r.Build()).ToArray(),
            [.. lines],
            responses.Select(r => r.Excluded).ToArray(),
            built[design.Factors.Count..])
        {
            RunOrder = design.RunOrder is null ? null : runOrder?.Build() ?? FileOrder(lines),
            RunOrderColumn = design.RunOrder?.Column,
        };
        var duplicate = RunOrderDuplicates.Find(design, data);
        return duplicate is null ? LoadResult<DesignData>.Success(data) : LoadResult<DesignData>.Failure(duplicate);
    }

    private static double[] FileOrder(List<int> lines) => lines.Select(l => (double)l).ToArray();

    private static string FirstLine(string message)
    {
        var cut = message.IndexOf('\n', StringComparison.Ordinal);
        return (cut < 0 ? message : message[..cut]).Trim();
    }
}
