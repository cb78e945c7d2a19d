using CellCheck.Core.Analysis;
using Spectre.Console;

namespace CellCheck.IO.Reports;

/// <summary>A table of checks: name, statistic, degrees of freedom, p and status.</summary>
internal static class CheckTable
{
    public static void Write(IAnsiConsole console, string title, IReadOnlyList<CheckResult> checks)
    {
        console.Write(new Text(title + "\n"));
        var table = new Table().Border(TableBorder.Minimal);
        table.AddColumn("check");
        table.AddColumn(new TableColumn("statistic").RightAligned());
        table.AddColumn(new TableColumn("df").RightAligned());
        table.AddColumn(new TableColumn("p").RightAligned());
        table.AddColumn("status");
        foreach (var k in checks)
        {
            table.AddRow(
                TerminalReportWriter.Plain(k.Check),
                TerminalReportWriter.Plain(k.Statistic is { } s ? NumberText.Value(s, 5) : "-"),
                TerminalReportWriter.Plain(k.Df is { } df ? string.Join(", ", df.Select(d => NumberText.Value(d))) : "-"),
                TerminalReportWriter.Plain(k.P is { } p ? NumberText.P(p) : "-"),
                TerminalReportWriter.Plain(TerminalReportWriter.Status(k)));
        }

        console.Write(table);
    }
}
