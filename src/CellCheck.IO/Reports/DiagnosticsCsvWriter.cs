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
                row["line"].Set(d.Lines[i].ToString(CultureInfo.InvariantCulture));
                var levels = r.Cells[d.Cells[i]].Levels;
                for (var f = 0; f < report.Design.Factors.Count; f++)
                {
                    row[report.Design.Factors[f]].Set(levels[f]);
                }

                row["fitted"].Set(Number(d.Fitted[i]));
                row["residual"].Set(Number(d.Residuals[i]));
                row["studentized"].Set(Number(d.Studentized[i]));
                row["studentized_external"].Set(Number(d.StudentizedExternal[i]));
                row["leverage"].Set(Number(d.Leverage[i]));
                row["cooks_distance"].Set(Number(d.CooksDistance[i]));
            }
        }
    }

    private static string Number(double x) => double.IsFinite(x) ? x.ToString("R", CultureInfo.InvariantCulture) : string.Empty;
}
