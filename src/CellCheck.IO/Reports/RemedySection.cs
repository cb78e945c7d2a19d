using CellCheck.Core.Analysis;
using CellCheck.Core.Remedies;
using Spectre.Console;

namespace CellCheck.IO.Reports;

/// <summary>The terminal block of a response's remedy: estimates and recommendation, and when a transformation was
/// applied the before-and-after table and the transformed response's findings; advice labelled as advice.</summary>
internal static class RemedySection
{
    public static void Write(IAnsiConsole console, ResponseReport r)
    {
        if (r.Remedy is not { } m)
        {
            return;
        }

        console.WriteLine();
        console.Write(new Text("Transformation\n"));
        if (m.BoxCox is { } bc)
        {
            console.Write(new Text(FitLine("Box-Cox", bc) + "\n"));
        }

        if (m.BoxCox is null && m.BoxCoxReason is { } reason)
        {
            console.Write(new Text("Box-Cox not computed: " + reason + ".\n"));
        }

        if (m.YeoJohnson is { } yj)
        {
            console.Write(new Text(FitLine("Yeo-Johnson", yj) + "\n"));
        }

        var sl = m.SpreadLevel;
        console.Write(new Text(sl.Slope is { } b
            ? "Spread versus level (" + NumberText.Count(sl.Cells) + " cells): log SD rises " + NumberText.Value(b, 3) + " per unit log mean; suggested power "
              + NumberText.Value(sl.Power!.Value, 3) + " (95% interval " + NumberText.Value(sl.PowerLower!.Value, 3) + " to "
              + NumberText.Value(sl.PowerUpper!.Value, 3) + ").\n"
            : "Spread versus level not computed: " + sl.Reason + ".\n"));
        console.Write(new Text("Recommended: " + (m.Recommended is { } rec
            ? rec.IsIdentity ? "none" : rec.Name + ", " + rec.Formula(r.Response)
            : "none (no power could be estimated)") + ".\n"));
        if (m.After is { } after && m.Applied is { } applied)
        {
            Comparison(console, m, after, applied.Formula(r.Response));
        }

        foreach (var note in m.Notes)
        {
            console.Write(new Text("Note: " + note + "\n"));
        }

        foreach (var advice in m.Advice)
        {
            console.Write(new Text("Advice: " + advice + "\n"));
        }
    }

    private static string FitLine(string family, PowerFit fit) =>
        family + " on model " + fit.Model + " (" + NumberText.Count(fit.N) + " rows): lambda " + NumberText.Fixed(fit.Lambda, 3)
        + ", 95% interval " + (fit.CiLower is { } lo ? NumberText.Fixed(lo, 3) : "below " + NumberText.Value(fit.SearchLower))
        + " to " + (fit.CiUpper is { } hi ? NumberText.Fixed(hi, 3) : "above " + NumberText.Value(fit.SearchUpper)) + ".";

    private static void Comparison(IAnsiConsole console, RemedyResult m, ResponseReport after, string formula)
    {
        console.WriteLine();
        console.Write(new Text("Before and after " + formula + " (every check re-run; assumption rows show the Holm-adjusted p)\n"));
        var table = new Table().Border(TableBorder.Minimal);
        table.AddColumn("item");
        table.AddColumn("check");
        table.AddColumn(new TableColumn("p before").RightAligned());
        table.AddColumn("before");
        table.AddColumn(new TableColumn("p after").RightAligned());
        table.AddColumn("after");
        foreach (var row in m.Comparison)
        {
            table.AddRow(
                TerminalReportWriter.Plain(row.Item),
                TerminalReportWriter.Plain(row.Check ?? "-"),
                TerminalReportWriter.Plain(P(row.Before)),
                TerminalReportWriter.Plain(TerminalReportWriter.Status(row.Before.Status)),
                TerminalReportWriter.Plain(P(row.After)),
                TerminalReportWriter.Plain(TerminalReportWriter.Status(row.After.Status)));
        }

        console.Write(table);
        if (m.SpreadLevel.Slope is { } before && m.SpreadLevelSlopeAfter is { } slope)
        {
            console.Write(new Text("Spread-versus-level slope " + NumberText.Value(before, 3) + " before, " + NumberText.Value(slope, 3)
                + " after (near 0 when the power steadies the spread).\n"));
        }

        console.Write(new Text("After " + formula + ": " + TerminalReportWriter.Status(after.Verdict.Status) + "\n"));
        foreach (var finding in after.Verdict.Findings)
        {
            console.Write(new Padder(new Text("- " + finding), new Padding(2, 0, 0, 0)));
        }
    }

    private static string P(ComparisonSide side) => (side.PAdjusted ?? side.P) is { } p ? NumberText.P(p) : "-";
}
