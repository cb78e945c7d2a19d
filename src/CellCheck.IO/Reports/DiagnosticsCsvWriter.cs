using System.Globalization;
using CellCheck.Core.Analysis;
using nietras.SeparatedValues;

namespace CellCheck.IO.Reports;

/// <summary>
/// Writes per-row diagnostics of every response as CSV (UTF-8, comma, invariant numbers, empty for values that do
/// not exist): response, data-file line, the cell's levels, fitted value, residual, internally and externally
/// studentized residuals, leverage and Cook's distance.
/// </summary>
/// <remarks>Rows are formatted in chunks side by side (at ten million rows the shortest round-trip text of sixty
/// million numbers is most of the work) and the chunks written in order, a bounded number at a time: the file is the
/// same, byte for byte, as one writer going through every row.</remarks>
public static class DiagnosticsCsvWriter
{
    /// <summary>Rows a chunk formats (about 2.5 MB of text).</summary>
    internal const int ChunkRows = 16_384;

    public static void Write(CheckReport report, Stream stream) => Write(report, stream, ChunkRows);

    /// <summary>As <see cref="Write(CheckReport, Stream)"/>, <paramref name="chunkRows"/> rows a chunk.</summary>
    internal static void Write(CheckReport report, Stream stream, int chunkRows)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(stream);
        ArgumentOutOfRangeException.ThrowIfLessThan(chunkRows, 1);
        var starts = new long[report.Responses.Count + 1];
        for (var r = 0; r < report.Responses.Count; r++)
        {
            var rows = report.Responses[r].Rows;
            starts[r + 1] = starts[r] + rows.Lines.Length;
            // every column built before the chunks read them side by side
            _ = (rows.Cells, rows.Fitted, rows.Studentized, rows.StudentizedExternal, rows.Leverage, rows.CooksDistance);
        }

        var chunks = Math.Max(1, (starts[^1] + chunkRows - 1) / chunkRows);
        // one buffer per chunk of a batch, kept from batch to batch (fresh ones at this size would each be a large object)
        var parts = new MemoryStream[(int)Math.Min(4 * Environment.ProcessorCount, chunks)];
        for (var k = 0; k < parts.Length; k++)
        {
            parts[k] = new MemoryStream();
        }

        for (var first = 0L; first < chunks; first += parts.Length)
        {
            var count = (int)Math.Min(parts.Length, chunks - first);
            Parallel.For(0, count, k => Chunk(report, starts, (first + k) * chunkRows, chunkRows, first + k == 0, parts[k]));
            for (var k = 0; k < count; k++)
            {
                stream.Write(parts[k].GetBuffer(), 0, (int)parts[k].Length);
            }
        }
    }

    /// <summary>The UTF-8 text of the rows from <paramref name="from"/> (counted over all responses in order), with the
    /// header line when <paramref name="header"/>, into <paramref name="bytes"/> (emptied first).</summary>
    private static void Chunk(CheckReport report, long[] starts, long from, int count, bool header, MemoryStream bytes)
    {
        bytes.SetLength(0);
        using (var text = new StreamWriter(bytes, new System.Text.UTF8Encoding(false), leaveOpen: true))
        {
            using var writer = Sep.New(',').Writer(o => o with { Escape = true, CultureInfo = CultureInfo.InvariantCulture, WriteHeader = header }).To(text);
            var end = Math.Min(from + count, starts[^1]);
            for (var r = 0; r < report.Responses.Count; r++)
            {
                var (lo, hi) = (Math.Max(from, starts[r]), Math.Min(end, starts[r + 1]));
                if (lo < hi)
                {
                    Rows(report, report.Responses[r], writer, (int)(lo - starts[r]), (int)(hi - starts[r]));
                }
            }
        }
    }

    private static void Rows(CheckReport report, ResponseReport r, SepWriter writer, int from, int to)
    {
        var d = r.Rows;
        for (var i = from; i < to; i++)
        {
            using var row = writer.NewRow();
            row["response"].Set(r.Response);
            row["line"].Format(d.Lines[i]);
            var levels = r.Cells[d.Cells[i]].Levels;
            for (var f = 0; f < report.Design.Factors.Count; f++)
            {
                row[report.Design.Factors[f]].Set(levels[f]);
            }

            Number(row["fitted"], d.Fitted[i]);
            Number(row["residual"], d.Residuals[i]);
            Number(row["studentized"], d.Studentized[i]);
            Number(row["studentized_external"], d.StudentizedExternal[i]);
            Number(row["leverage"], d.Leverage[i]);
            Number(row["cooks_distance"], d.CooksDistance[i]);
        }
    }

    /// <summary>The shortest text that reads back as the same double (as "R" writes it), formatted in place without a
    /// string per value; empty when not finite.</summary>
    private static void Number(SepWriter.Col col, double x)
    {
        if (double.IsFinite(x))
        {
            col.Format(x);
        }
        else
        {
            col.Set(ReadOnlySpan<char>.Empty);
        }
    }
}
