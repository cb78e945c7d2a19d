using nietras.SeparatedValues;

namespace CellCheck.IO.Data;

/// <summary>Delimited text through Sep: separator declared or detected from the header; quoted fields; UTF-8 with or without BOM.</summary>
internal sealed class CsvRows : ITableRows
{
    private readonly SepReader _reader;

    public CsvRows(string path, char? delimiter, NumberSyntax numbers)
    {
        _reader = delimiter is { } d
            ? Sep.New(d).Reader(o => o with { Unescape = true }).FromFile(path)
            : Sep.Reader(o => o with { Unescape = true }).FromFile(path);
        Header = _reader.Header.ColNames;
        Numbers = numbers;
    }

    public IReadOnlyList<string> Header { get; }

    public NumberSyntax Numbers { get; }

    public int Line { get; private set; }

    /// <summary>First line after the last row read (where a ragged row starts).</summary>
    public int NextLine { get; private set; } = 2;

    public bool IsEmpty => _reader.Header.IsEmpty;

    public bool Next()
    {
        if (!_reader.MoveNext())
        {
            return false;
        }

        Line = _reader.Current.LineNumberFrom;
        NextLine = _reader.Current.LineNumberToExcl;
        return true;
    }

    public ReadOnlySpan<char> Cell(int column) => _reader.Current[column].Span.Trim();

    public string Locate(int line, int column) => "line " + line.ToString(System.Globalization.CultureInfo.InvariantCulture);

    public void Dispose() => _reader.Dispose();
}
