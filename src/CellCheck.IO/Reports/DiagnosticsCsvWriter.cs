using System.Globalization;
using CellCheck.Core.Analysis;
using nietras.SeparatedValues;

namespace CellCheck.IO.Reports;

/// <summary>
/// Writes per-row diagnostics of every response as CSV (UTF-8, comma, invariant numbers, empty for values that do
/// not exist): response, data-file line, the cell's levels, fitted value, residual, internally and externally
/// studentized residuals, leverage and Cook's distance.
/// </summary>
public static class DiagnosticsCsvWriter
{
    public static void Write(CheckReport report, Stream stream)
    {
        ArgumentNullException.ThrowIfNull(report);
        using var text = new StreamWriter(stream, new System.Text.UTF8Encoding(false), leaveOpen: true);
        using var writer = Sep.New(',').Writer(o => o with { Escape = true, CultureInfo = CultureInfo.InvariantCulture }).To(text);
        foreach (var r in report.Responses)
        {
            var d = r.Rows;
            for (var i = 0; i < d.Lines.Length; i++)
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
