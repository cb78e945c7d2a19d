using CellCheck.Core.Analysis;
using CellCheck.IO.Html;
using CellCheck.IO.Reports;

namespace CellCheck.Fuzz;

/// <summary>
/// What must hold for every report, whatever the data: every p-value is in [0, 1] or absent (a verdict never rests
/// on NaN), and every report writer finishes.
/// </summary>
internal static class ReportValues
{
    public static void Check(CheckReport report)
    {
        foreach (var r in report.Responses)
        {
            var checks = r.Cells.SelectMany(c => c.Checks).Concat(r.Pooled.Checks).Concat(r.Spread.Checks)
                .Concat(r.Model.Checks).Concat(r.Order.Checks).Concat(r.Order.ByBlock.SelectMany(b => b.Checks));
            foreach (var c in checks)
            {
                Probability(c.P, r.Response + " " + c.Check + " p");
                Probability(c.PAdjusted, r.Response + " " + c.Check + " adjusted p");
            }

            foreach (var a in r.Verdict.Assumptions)
            {
                Probability(a.P, r.Response + " primary " + a.Assumption + " p");
                Probability(a.PAdjusted, r.Response + " primary " + a.Assumption + " adjusted p");
            }
        }
    }

    public static void WriteAll(CheckReport report)
    {
        using var json = new MemoryStream();
        JsonReportWriter.Write(report, json, "fuzz");
        using var csv = new MemoryStream();
        DiagnosticsCsvWriter.Write(report, csv);
        using var text = new StringWriter();
        TerminalReportWriter.Write(report, text, "fuzz");
        _ = HtmlReportWriter.Render(report, new HtmlContext("0", DateTimeOffset.UnixEpoch, "fuzz"));
    }

    private static void Probability(double? p, string what)
    {
        if (p is { } value && !(value >= 0 && value <= 1))
        {
            throw new InvalidOperationException($"{what} is {value}, outside [0, 1].");
        }
    }
}
