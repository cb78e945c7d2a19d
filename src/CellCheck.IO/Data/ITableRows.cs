using CellCheck.Core.Problems;

namespace CellCheck.IO.Data;

/// <summary>
/// A data table read row by row, from delimited text or a spreadsheet: the header, the current row's cells as text,
/// the row's location (data-file line, or spreadsheet row) and how numbers are written in the source.
/// </summary>
internal interface ITableRows : IDisposable
{
    IReadOnlyList<string> Header { get; }

    /// <summary>How numbers are written: the design's decimal and thousands separators for text, invariant for spreadsheets.</summary>
    NumberSyntax Numbers { get; }

    /// <summary>The current row's line in the data file (or its row number in the sheet).</summary>
    int Line { get; }

    /// <summary>The first problem met while reading rows (a ragged row, an unclosed quote, an unreadable sheet), or null.
    /// Check it once reading has ended: <see cref="Next"/> returns false at a fault that stops reading.</summary>
    Problem? Fault { get; }

    /// <summary>Moves to the next data row; false at the end.</summary>
    bool Next();

    /// <summary>The current row's cell in <paramref name="column"/> as text, trimmed.</summary>
    ReadOnlySpan<char> Cell(int column);

    /// <summary>Words naming where a cell is, for messages ("line 7", "sheet 'trial', cell C7").</summary>
    string Locate(int line, int column);
}
