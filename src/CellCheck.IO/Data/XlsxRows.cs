using System.Globalization;
using CellCheck.Core.Problems;
using MiniExcelLibs;

namespace CellCheck.IO.Data;

/// <summary>
/// A spreadsheet sheet through MiniExcel: the header row (1-based, default 1), then one data row per sheet row;
/// numbers as numbers (formulas give their cached values), dates as ISO date-times, empty cells as empty text.
/// </summary>
internal sealed class XlsxRows : ITableRows
{
    private readonly IEnumerator<IDictionary<string, object?>> _rows;
    private readonly string[] _letters;
    private readonly string _sheet;
    private readonly string _path;
    private IDictionary<string, object?>? _current;
    private string _cell = string.Empty;

    private XlsxRows(string path, IEnumerator<IDictionary<string, object?>> rows, string sheet, int headerRow, IDictionary<string, object?> header)
    {
        _path = path;
        _rows = rows;
        _sheet = sheet;
        _letters = [.. header.Keys];
        Header = _letters.Select(k => Text(header[k])).ToArray();
        Line = headerRow;
    }

    public IReadOnlyList<string> Header { get; }

    public NumberSyntax Numbers => NumberSyntax.Invariant;

    public int Line { get; private set; }

    public Problem? Fault { get; private set; }

    public static string[] SheetNames(string path) => [.. MiniExcel.GetSheetNames(path)];

    /// <summary>Opens <paramref name="sheet"/> and reads up to the header row; null when the sheet has no such row.</summary>
    public static XlsxRows? Open(string path, string sheet, int headerRow)
    {
        var rows = MiniExcel.Query(path, useHeaderRow: false, sheetName: sheet).Cast<IDictionary<string, object?>>().GetEnumerator();
        for (var r = 1; r <= headerRow; r++)
        {
            if (!rows.MoveNext())
            {
                rows.Dispose();
                return null;
            }
        }

        return new XlsxRows(path, rows, sheet, headerRow, rows.Current);
    }

    /// <summary>Column letter of column index <paramref name="column"/>.</summary>
    public string Letter(int column) => _letters[column];

    public bool Next()
    {
        try
        {
            while (_rows.MoveNext())
            {
                Line++;
                _current = _rows.Current;
                if (_current.Values.Any(v => v is not null && Text(v).Length > 0))
                {
                    return true;
                }
            }
        }
        catch (Exception ex) when (ex is not OutOfMemoryException)
        {
            // A damaged workbook can fail anywhere inside the zip and XML readers, with any exception type: it is
            // the user's file that is broken, so it is a located problem, not a crash.
            Fault ??= new Problem(ProblemCodes.DataUnreadable, _path, Line + 1, null,
                $"The workbook cannot be read past row {Line.ToString(CultureInfo.InvariantCulture)} of sheet '{_sheet}': {TableOpener.FirstLine(ex.Message)}",
                "Open the workbook in a spreadsheet program and save it again, or export the sheet as CSV UTF-8.");
        }

        return false;
    }

    public ReadOnlySpan<char> Cell(int column)
    {
        _cell = _current is not null && _current.TryGetValue(_letters[column], out var v) ? Text(v) : string.Empty;
        return _cell.AsSpan().Trim();
    }

    public string Locate(int line, int column) =>
        "sheet '" + _sheet + "', cell " + _letters[column] + line.ToString(CultureInfo.InvariantCulture);

    public void Dispose() => _rows.Dispose();

    private static string Text(object? value) => value switch
    {
        null => string.Empty,
        double d => d.ToString("R", CultureInfo.InvariantCulture),
        float f => ((double)f).ToString("R", CultureInfo.InvariantCulture),
        int i => i.ToString(CultureInfo.InvariantCulture),
        long l => l.ToString(CultureInfo.InvariantCulture),
        decimal m => m.ToString(CultureInfo.InvariantCulture),
        DateTime t => t.ToString("yyyy-MM-ddTHH:mm:ss", CultureInfo.InvariantCulture),
        bool b => b ? "TRUE" : "FALSE",
        _ => Convert.ToString(value, CultureInfo.InvariantCulture) ?? string.Empty,
    };
}
