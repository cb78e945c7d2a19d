using CellCheck.Core.Problems;
using CellCheck.IO.Design;
using CellCheck.IO.TextFiles;

namespace CellCheck.IO.Data;

/// <summary>Opens the design's data file as delimited text or an XLSX sheet, and checks its header.</summary>
internal static class TableOpener
{
    /// <param name="scanned">True when the caller checks the file's encoding itself (<see cref="ScanText"/>).</param>
    public static (ITableRows? Table, Problem? Problem) Open(DesignFile design, bool scanned = false)
    {
        var path = design.DataPath;
        Problem Fail(string code, int? line, string what, string fix, bool inDesign = false) =>
            inDesign ? new Problem(code, design.Path, design.DataMark.Line, design.DataMark.Column, what, fix) : new Problem(code, path, line, null, what, fix);
        if (Directory.Exists(path))
        {
            return (null, Fail(ProblemCodes.DataUnreadable, null, $"The data file '{design.DataText}' is a folder, not a file (at {path}).",
                "Name the data file inside that folder, relative to the design file.", inDesign: true));
        }

        if (!File.Exists(path))
        {
            return (null, Fail(ProblemCodes.DataNotFound, null, $"The data file '{design.DataText}' does not exist (looked for {path}).",
                "Give the data file's path relative to the design file.", inDesign: true));
        }

        var extension = Path.GetExtension(path).ToLowerInvariant();
        try
        {
            ITableRows table;
            if (extension == ".xlsx")
            {
                var names = XlsxRows.SheetNames(path);
                var sheet = SheetName(design.Options.Sheet, names);
                if (sheet is null)
                {
                    return (null, Fail(ProblemCodes.SheetNotFound, null, $"The workbook has no sheet '{design.Options.Sheet}' (sheets: {string.Join(", ", names)}).",
                        "Write sheet: with one of these names, or its position from 1.", inDesign: true));
                }

                var xlsx = XlsxRows.Open(path, sheet, design.Options.HeaderRow);
                if (xlsx is null)
                {
                    return (null, Fail(ProblemCodes.DataEmpty, design.Options.HeaderRow, $"The sheet '{sheet}' has no row {design.Options.HeaderRow} to read the header from.",
                        "Check sheet: and header_row: in the design file."));
                }

                table = xlsx;
            }
            else if (IsText(path))
            {
                if (!scanned && ScanText(path) is { } fault)
                {
                    return (null, TextProblems.For(fault, path, design: false));
                }

                var csv = new CsvRows(path, design.Options.Delimiter, new NumberSyntax(design.Options.Decimal, design.Options.Thousands));
                if (csv.IsEmpty)
                {
                    csv.Dispose();
                    return (null, Fail(ProblemCodes.DataEmpty, 1, "The data file is empty.", "The first line must name the columns; each following line holds one run."));
                }

                table = csv;
            }
            else
            {
                return (null, Fail(ProblemCodes.DataUnsupportedFormat, null, $"'{design.DataText}' is neither delimited text (.csv, .tsv, .txt) nor a workbook (.xlsx).",
                    "Save the data as CSV (UTF-8) or XLSX and name that file.", inDesign: true));
            }

            return HeaderProblem(table, path) is { } problem ? (Dispose(table), problem) : (table, null);
        }
        catch (ArgumentException ex) when (ex.Message.Contains("found", StringComparison.Ordinal))
        {
            return (null, Fail(ProblemCodes.DuplicateColumn, 1, "The header names a column more than once: " + FirstLine(ex.Message), "Give every column of the header its own name."));
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException or InvalidOperationException or InvalidDataException or System.Xml.XmlException)
        {
            return (null, Fail(ProblemCodes.DataUnreadable, null, "The data file cannot be read: " + FirstLine(ex.Message),
                "Check that it is a delimited text file or an XLSX workbook, not locked, and readable."));
        }
        catch (Exception ex) when (extension == ".xlsx" && ex is not OutOfMemoryException)
        {
            // A damaged workbook can fail anywhere inside the zip and XML readers, with any exception type.
            return (null, Fail(ProblemCodes.DataUnreadable, null, "The workbook cannot be read: " + FirstLine(ex.Message),
                "Open the workbook in a spreadsheet program and save it again, or export the sheet as CSV UTF-8."));
        }
    }

    /// <summary>True for the delimited-text extensions.</summary>
    public static bool IsText(string path) => Path.GetExtension(path).ToLowerInvariant() is ".csv" or ".tsv" or ".txt";

    public static TextFault? ScanText(string path)
    {
        using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1 << 16);
        return TextScan.Scan(stream, TextScan.MaxLineBytes);
    }

    private static ITableRows? Dispose(ITableRows table)
    {
        table.Dispose();
        return null;
    }

    private static Problem? HeaderProblem(ITableRows table, string path)
    {
        if (table.Header.Count == 1 && string.IsNullOrWhiteSpace(table.Header[0]))
        {
            return new Problem(ProblemCodes.EmptyHeader, path, table is CsvRows ? 1 : table.Line, null, "The header line is blank: the first line must name the columns.",
                "Remove blank lines above the header, so that the first line names the columns.");
        }

        for (var i = 0; i < table.Header.Count; i++)
        {
            if (string.IsNullOrWhiteSpace(table.Header[i]) && i < table.Header.Count - 1)
            {
                return new Problem(ProblemCodes.EmptyHeader, path, null, i + 1, $"The header cell at {table.Locate(table.Line, i)} is empty (a merged or missing header).",
                    "Give every column a name in the header row (unmerge merged header cells).");
            }

            for (var j = 0; j < i; j++)
            {
                if (!string.IsNullOrEmpty(table.Header[i]) && string.Equals(table.Header[i], table.Header[j], StringComparison.Ordinal))
                {
                    return new Problem(ProblemCodes.DuplicateColumn, path, null, i + 1, $"The header names '{table.Header[i]}' twice ({table.Locate(table.Line, j)} and {table.Locate(table.Line, i)}).",
                        "Give every column of the header its own name.");
                }
            }
        }

        return null;
    }

    private static string? SheetName(string? wanted, string[] names)
    {
        if (wanted is null)
        {
            return names.FirstOrDefault();
        }

        if (names.Contains(wanted, StringComparer.Ordinal))
        {
            return wanted;
        }

        return int.TryParse(wanted, System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out var index)
            && index >= 1 && index <= names.Length ? names[index - 1] : null;
    }

    /// <summary>The first line of a library's message, at most 200 characters (it may quote a whole hostile header).</summary>
    internal static string FirstLine(string message)
    {
        var cut = message.IndexOf('\n', StringComparison.Ordinal);
        var line = (cut < 0 ? message : message[..cut]).Trim();
        return line.Length <= 200 ? line : line[..197] + "...";
    }
}
