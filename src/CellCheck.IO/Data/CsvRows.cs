using System.Globalization;
using CellCheck.Core.Problems;
using nietras.SeparatedValues;

namespace CellCheck.IO.Data;

/// <summary>
/// Delimited text through Sep: separator declared or detected from the header; quoted fields; UTF-8 with or without BOM.
/// Blank lines are skipped. A row with another number of fields than the header stops reading with a located
/// <see cref="Fault"/>, and so (at the end) does a used field that runs over several lines, the mark of a quote
/// that was never closed.
/// </summary>
internal sealed class CsvRows : ITableRows
{
    private readonly SepReader _reader;
    private readonly string _path;
    private readonly int _lineOffset;
    private bool _multiline;

    public CsvRows(string path, char? delimiter, NumberSyntax numbers)
        : this(path, Options(delimiter).FromFile(path), numbers, 0)
    {
    }

    /// <summary>Rows of one range of the file at <paramref name="path"/>: <paramref name="range"/> holds the header line
    /// and then the range's lines, the first of which is line <paramref name="firstLine"/> of the file.</summary>
    public CsvRows(string path, Stream range, char? delimiter, NumberSyntax numbers, int firstLine)
        : this(path, Options(delimiter).From(range), numbers, firstLine - 2)
    {
    }

    private CsvRows(string path, SepReader reader, NumberSyntax numbers, int lineOffset)
    {
        _path = path;
        _reader = reader;
        _lineOffset = lineOffset;
        Header = _reader.Header.ColNames;
        Numbers = numbers;
        NextLine += lineOffset;
    }

    public IReadOnlyList<string> Header { get; }

    public NumberSyntax Numbers { get; }

    public int Line { get; private set; }

    /// <summary>First line after the last row read (where a ragged row starts).</summary>
    public int NextLine { get; private set; } = 2;

    public bool IsEmpty => _reader.Header.IsEmpty;

    public Problem? Fault { get; private set; }

    /// <summary>Reading ends before the row that starts on this line (the first line of a range read by another reader).</summary>
    public int StopLine { get; set; } = int.MaxValue;

    public bool Next()
    {
        while (_reader.MoveNext())
        {
            var row = _reader.Current;
            if (row.LineNumberFrom + _lineOffset >= StopLine)
            {
                return false;
            }

            Line = row.LineNumberFrom + _lineOffset;
            NextLine = row.LineNumberToExcl + _lineOffset;
            if (row.ColCount == 1 && row[0].Span.IsWhiteSpace() && Header.Count > 1)
            {
                continue;
            }

            if (row.ColCount != Header.Count)
            {
                Fault ??= NextLine - Line > 1
                    ? new Problem(ProblemCodes.UnclosedQuote, _path, Line, null,
                        $"The row that starts on line {Text(Line)} runs over lines {Text(Line)} to {Text(NextLine - 1)} and has {Text(row.ColCount)} field(s) where the header has {Text(Header.Count)}: a quote on line {Text(Line)} is probably not closed.",
                        "Close the quote on that line (a quote inside a quoted field is written twice: \"\").")
                    : new Problem(ProblemCodes.RaggedRow, _path, Line, null,
                        $"Line {Text(Line)} has {Text(row.ColCount)} field(s) but the header has {Text(Header.Count)}.",
                        "Check for a missing or extra separator on this line, or a quote that is not closed.");
                return false;
            }

            _multiline = NextLine - Line > 1;
            return true;
        }

        return false;
    }

    public ReadOnlySpan<char> Cell(int column)
    {
        var cell = _reader.Current[column].Span.Trim();
        if (_multiline && Fault is null && cell.IndexOfAny('\r', '\n') >= 0)
        {
            Fault = new Problem(ProblemCodes.UnclosedQuote, _path, Line, column + 1,
                $"The quoted field in column '{Header[column]}' that opens on line {Text(Line)} runs over lines {Text(Line)} to {Text(NextLine - 1)}: a closing quote is probably missing.",
                "Close the quote on that line (a quote inside a quoted field is written twice: \"\"), or remove the line break from the field.")
            { ColumnName = Header[column] };
        }

        return cell;
    }

    public string Locate(int line, int column) => "line " + Text(line);

    public void Dispose() => _reader.Dispose();

    private static SepReaderOptions Options(char? delimiter) => delimiter is { } d
        ? Sep.New(d).Reader(o => o with { Unescape = true, DisableColCountCheck = true })
        : Sep.Reader(o => o with { Unescape = true, DisableColCountCheck = true });

    private static string Text(int value) => value.ToString(CultureInfo.InvariantCulture);
}
