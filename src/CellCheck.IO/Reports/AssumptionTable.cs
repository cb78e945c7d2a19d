using CellCheck.Core.Analysis;
using Spectre.Console;

namespace CellCheck.IO.Reports;

/// <summary>The terminal table of assumption decisions and the verdict's operating characteristics.</summary>
internal static class AssumptionTable
{
    public static void Write(IAnsiConsole console, Verdict verdict)
    {
        console.Write(new Text("Assumptions (each decided by one primary check; Holm across those judged)\n"));
        var table = new Table().Border(TableBorder.Minimal);
        table.AddColumn("assumption");
        table.AddColumn("primary check");
        table.AddColumn(new TableColumn("statistic").RightAligned());
        table.AddColumn(new TableColumn("p").RightAligned());
        table.AddColumn(new TableColumn("Holm p").RightAligned());
        table.AddColumn("status");
        foreach (var a in verdict.Assumptions)
        {
            table.AddRow(
                TerminalReportWriter.Plain(a.Assumption),
                TerminalReportWriter.Plain(a.Check ?? "-"),
                TerminalReportWriter.Plain(a.Statistic is { } s ? NumberText.Value(s, 5) : "-"),
                TerminalReportWriter.Plain(a.P is { } p ? NumberText.P(p) : "-"),
                TerminalReportWriter.Plain(a.PAdjusted is { } q ? NumberText.P(q) : "-"),
                TerminalReportWriter.Plain(a.Status == CheckStatus.NotTestable ? "not judged" : TerminalReportWriter.Status(a.Status)));
        }

        console.Write(table);
        var method = verdict.Assumptions.FirstOrDefault(a => a.P is not null)?.PMethod;
        if (method is not null)
        {
            console.Write(new Text("p-values of the primary checks: " + method + ".\n"));
        }

        if (verdict.Operating is { } o)
        {
            console.Write(new Text("For these cell sizes the verdict flags clean data " + Percent(o.FalseAlarm.Rate) + " of the time (95% CI "
                + Percent(o.FalseAlarm.Lower) + " to " + Percent(o.FalseAlarm.Upper) + "); it catches a 4:1 variance ratio in one cell "
                + Percent(o.VarianceRatio4.Rate) + " and a lognormal cell (shape 0.5) " + Percent(o.Lognormal.Rate) + " of the time ("
                + NumberText.Count(o.FalseAlarm.Draws) + " simulated data sets each, for the normality and spread decisions; the independence p is exact).\n"));
        }
    }

    private static string Percent(double rate) => NumberText.Fixed(100 * rate, 1) + "%";
}
