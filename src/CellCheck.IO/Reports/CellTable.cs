using CellCheck.Core.Analysis;
using Spectre.Console;

namespace CellCheck.IO.Reports;

/// <summary>The per-cell table: levels, n, mean, SD, Shapiro-Wilk W, p, adjusted p and status.</summary>
internal static class CellTable
{
    public static void Write(IAnsiConsole console, ResponseReport r, IReadOnlyList<string> factors)
    {
        console.Write(new Text("Supporting: normality within each cell (Shapiro-Wilk; p adjusted across cells)" + "\n"));
        var table = new Table().Border(TableBorder.Minimal);
        foreach (var f in factors)
        {
            table.AddColumn(new TableColumn(Markup.Escape(f)));
        }

        foreach (var h in new[] { "n", "mean", "sd", "W", "p", "p adj" })
        {
            table.AddColumn(new TableColumn(h).RightAligned());
        }

        table.AddColumn(new TableColumn("status"));
        var rows = r.Cells.Count > TerminalReportWriter.CellRowsLimit
            ? r.Cells.Where(c => c.Status != CheckStatus.Pass).ToList()
            : r.Cells;
        foreach (var cell in rows)
        {
            var sw = cell.Checks[0];
            var cells = cell.Levels.Select(TerminalReportWriter.Plain).ToList();
            cells.Add(TerminalReportWriter.Plain(NumberText.Count(cell.N)));
            cells.Add(TerminalReportWriter.Plain(NumberText.Value(cell.Mean)));
            cells.Add(TerminalReportWriter.Plain(NumberText.Value(cell.Sd, 3)));
            cells.Add(TerminalReportWriter.Plain(sw.Statistic is { } w ? NumberText.Fixed(w, 3) : "-"));
            cells.Add(TerminalReportWriter.Plain(sw.P is { } p ? NumberText.P(p) : "-"));
            cells.Add(TerminalReportWriter.Plain(sw.PAdjusted is { } pa ? NumberText.P(pa) : "-"));
            cells.Add(TerminalReportWriter.Plain(CellStatus(cell)));
            table.AddRow(cells);
        }

        console.Write(table);
        if (rows.Count < r.Cells.Count)
        {
            console.Write(new Text($"{r.Cells.Count - rows.Count} passing cells are not listed here; the JSON report lists every cell.\n"));
        }
    }

    private static string CellStatus(CellResult cell)
    {
        if (cell.Status != CheckStatus.NotTestable)
        {
            var flagged = cell.Checks.Where(c => c.Status == CheckStatus.Flag).Select(c => c.Check == CheckNames.ShapiroWilk ? "SW" : "AD").ToList();
            return flagged.Count == 0 ? "pass" : "FLAG ! " + string.Join("+", flagged);
        }

        return "n/t: " + cell.Checks[0].Reason;
    }
}
