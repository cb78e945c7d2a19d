using CellCheck.Core.Analysis;
using CellCheck.Core.Planning;
using Spectre.Console;

namespace CellCheck.IO.Reports;

/// <summary>The terminal block of one response's plan: the SD used and the power of every term now and at the replicates it needs.</summary>
internal static class PlanResponseSection
{
    public static void Write(IAnsiConsole console, ResponsePlan r, DesignPlan plan)
    {
        var unit = r.Unit is null ? string.Empty : " " + r.Unit;
        console.Write(new Rule(Markup.Escape($"Response {r.Response}{(r.Unit is null ? string.Empty : " (" + r.Unit + ")")}")) { Justification = Justify.Left });
        var balanced = r.Balanced ? string.Empty : " on average (unbalanced; the plan assumes every cell equal)";
        var sd = r.Reason is not null ? "no within-cell SD"
            : r.SdFromData
                ? $"within-cell SD {NumberText.Value(r.Sd)}{unit} from the data (pooled residual SD, {NumberText.Count(r.SdDf)} df)"
                : $"within-cell SD {NumberText.Value(r.Sd)}{unit} as given";
        var df2 = plan.Design.ResidualDf(r.CurrentReplicates);
        var residual = df2 >= 1 ? $", {NumberText.Value(df2)} residual df in the planned model" : string.Empty;
        console.Write(new Text($"Now: {NumberText.Count(r.CurrentReplicates)} replicate(s) per cell{balanced}{residual}; {sd}.\n"));
        if (r.Reason is not null)
        {
            console.Write(new Text("Not planned: the data leave no residual degrees of freedom to estimate the SD. Give it with --sd.\n"));
            return;
        }

        var table = new Table().Border(TableBorder.Minimal);
        table.AddColumn("term");
        table.AddColumn(new TableColumn("df").RightAligned());
        table.AddColumn(new TableColumn("λ now").RightAligned());
        table.AddColumn(new TableColumn("power now").RightAligned());
        table.AddColumn(new TableColumn("replicates needed").RightAligned());
        table.AddColumn(new TableColumn("power there").RightAligned());
        table.AddColumn(new TableColumn("one fewer").RightAligned());
        foreach (var t in r.Terms)
        {
            table.AddRow(
                TerminalReportWriter.Plain(t.Term),
                TerminalReportWriter.Plain(NumberText.Count(t.Df1)),
                TerminalReportWriter.Plain(t.Current is { } l ? NumberText.Value(l.Lambda) : "-"),
                TerminalReportWriter.Plain(t.Current is { } p ? PlanText.Power(p.Power) : "-"),
                TerminalReportWriter.Plain(t.Needed is { } n ? NumberText.Count(n) : "not reached: " + t.Reason),
                TerminalReportWriter.Plain(t.AtNeeded is { } a ? PlanText.Power(a.Power) : "-"),
                TerminalReportWriter.Plain(t.BelowNeeded is { } b ? PlanText.Power(b.Power) : "-"));
        }

        console.Write(table);
        var worst = r.Terms.Where(t => t.Needed is not null).MaxBy(t => t.Needed);
        var reached = r.Terms.Where(t => t.Needed is not null && t.Needed <= r.CurrentReplicates).Select(t => t.Term).ToList();
        if (worst is not null)
        {
            console.Write(new Text($"Every term's F test reaches power {NumberText.Fixed(plan.Request.Power, 2)} with {NumberText.Count(worst.Needed!.Value)} "
                + $"replicates per cell (the most demanding term: {worst.Term}). "
                + (reached.Count == r.Terms.Count ? "The current replicates already suffice for all terms." : reached.Count == 0
                    ? "No term reaches it with the current replicates."
                    : "Already reached now: " + string.Join(", ", reached) + ".") + "\n"));
        }
    }
}
