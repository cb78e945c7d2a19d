using CellCheck.Core.Data;
using CellCheck.Core.Problems;
using CellCheck.IO.Design;

namespace CellCheck.IO.Data;

/// <summary>
/// Reads the data file of a design straight into columns: delimited text (separator detected from the header or
/// declared; quoted fields; UTF-8 with or without BOM; decimal comma and thousands separator as declared) or an XLSX
/// sheet. Only the columns the design names are kept. A missing factor or block value excludes the row for every
/// response; a missing or non-numeric response value excludes it for that response; rows outside the design's
/// <c>where</c> filter are counted. Every exclusion is kept with its line and reason. A large delimited file without
/// quotes is read in ranges on every processor (<see cref="SplitReader"/>), to the same data.
/// </summary>
public static class DataReader
{
    /// <summary>Delimited files above this size are checked for encoding faults on a second thread while they are parsed;
    /// a fault, when found, is reported in place of whatever the parse gave.</summary>
    public const long ConcurrentScanBytes = 8 << 20;

    /// <summary>Delimited files above this size without quotes are read in ranges on several threads (<see cref="SplitReader"/>).</summary>
    internal const long SplitBytes = 8 << 20;

    /// <summary>Ranges per reading thread: more ranges than threads, so that a thread slowed by other work (the encoding
    /// check beside the parse, another process) reads fewer of them and the threads end together.</summary>
    internal const int RangesPerThread = 2;

    public static LoadResult<DesignData> Read(DesignFile design) => Read(design, SplitBytes);

    /// <param name="splitBytes">The size above which a delimited file is read on several threads (tests lower it).</param>
    /// <param name="threads">Threads that read a split file (at least two; the processor count when null).</param>
    /// <param name="ranges">Ranges a split file is cut into (at least two; <see cref="RangesPerThread"/> a thread when null).</param>
    internal static LoadResult<DesignData> Read(DesignFile design, long splitBytes, int? threads = null, int? ranges = null)
    {
        ArgumentNullException.ThrowIfNull(design);
        var path = design.DataPath;
        var scan = TableOpener.IsText(path) && File.Exists(path) && new FileInfo(path).Length > ConcurrentScanBytes
            ? Task.Run(() => ScanQuietly(path))
            : null;
        var readers = Math.Max(2, threads ?? Environment.ProcessorCount);
        var result = Parse(design, scan is not null, splitBytes, readers, Math.Max(2, ranges ?? (RangesPerThread * readers)));
        return scan?.Result is { } fault ? LoadResult<DesignData>.Failure(TextFiles.TextProblems.For(fault, path, design: false)) : result;
    }

    /// <summary>The encoding check, leaving a file that cannot be read to the parse, which reports it.</summary>
    private static TextFiles.TextFault? ScanQuietly(string path)
    {
        try
        {
            return TableOpener.ScanText(path);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            return null;
        }
    }

    private static LoadResult<DesignData> Parse(DesignFile design, bool scanned, long splitBytes, int threads, int ranges)
    {
        var opened = TableOpener.Open(design, scanned);
        if (opened.Problem is not null)
        {
            return LoadResult<DesignData>.Failure(opened.Problem);
        }

        using var table = opened.Table!;
        try
        {
            return table is CsvRows csv && SplitPlan.Find(design.DataPath, splitBytes, ranges) is { } plan
                ? SplitReader.Read(design, csv, plan, threads)
                : RowReader.Read(design, table);
        }
        catch (InvalidDataException ex)
        {
            return LoadResult<DesignData>.Failure(RaggedRow(design, (table as CsvRows)?.NextLine ?? table.Line + 1, ex));
        }
        catch (IOException ex)
        {
            return LoadResult<DesignData>.Failure(Unreadable(design, ex));
        }
    }

    /// <summary>The problem for a row the delimited-text reader refuses, starting on <paramref name="line"/>.</summary>
    internal static Problem RaggedRow(DesignFile design, int line, InvalidDataException ex) =>
        new(ProblemCodes.RaggedRow, design.DataPath, line, null,
            "A row has a different number of fields than the header: " + TableOpener.FirstLine(ex.Message),
            "Check for a missing or extra separator on this line, or a quote that is not closed.");

    /// <summary>The problem for a data file that fails while it is read.</summary>
    internal static Problem Unreadable(DesignFile design, IOException ex) =>
        new(ProblemCodes.DataUnreadable, design.DataPath, null, null,
            "The data file cannot be read: " + ex.Message, "Check that the file is not locked and is readable.");
}
