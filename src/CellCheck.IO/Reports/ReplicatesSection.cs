using CellCheck.Core.Analysis;
using CellCheck.Core.Planning;
using Spectre.Console;

namespace CellCheck.IO.Reports;

/// <summary>The terminal block "are there enough replicates": census verdict with its rule, plain words, and the
/// sensitivity table of the single checks.</summary>
internal static class ReplicatesSection
{
    public static void Write(IAnsiConsole console, ResponseReport r)
    {
        if (r.Replicates is not { } rep)
        {
            return;
        }

        console.Write(new Text($"Replicates: {SensitivityWords.Word(rep.Census.Level)}. Rule: {rep.Census.Rule}.\n"));
        foreach (var line in rep.Summary)
        {
            console.Write(new Padder(new Text("- " + line), new Padding(2, 0, 0, 0)));
        }

        var t = rep.Sensitivity;
        if (t.Note is not null)
        {
            console.Write(new Text("Sensitivity of the checks: " + t.Note + ".\n"));
            return;
        }

        console.Write(new Text($"What each check could have seen at these cell sizes: how often it catches one lognormal cell (shape 0.5; normality checks) "
            + $"or one cell with 4 times the variance (spread checks), each cell in turn, and how often it flags clean data (alpha {NumberText.Value(t.Alpha)}, within-cell p "
            + $"adjusted: {CheckRun.AdjustName(t.Adjust)}; {NumberText.Count(t.Draws)} simulated data sets each)\n"));
        var table = new Table().Border(TableBorder.Minimal);
        table.AddColumn("check");
        table.AddColumn("where");
        table.AddColumn(new TableColumn("catches").RightAligned());
        table.AddColumn(new TableColumn("95% CI").RightAligned());
        table.AddColumn(new TableColumn("false alarms").RightAligned());
        foreach (var row in t.Rows)
        {
            table.AddRow(
                TerminalReportWriter.Plain(row.Check),
                TerminalReportWriter.Plain(row.Scope),
                TerminalReportWriter.Plain(row.Catches is { } c ? PlanText.Percent(c.Rate) : "not-testable"),
                TerminalReportWriter.Plain(row.Catches is { } d ? PlanText.Percent(d.Lower) + " to " + PlanText.Percent(d.Upper) : row.Reason ?? "-"),
                TerminalReportWriter.Plain(row.FalseAlarm is { } f ? PlanText.Percent(f.Rate) : "-"));
        }

        console.Write(table);
    }
}
