using CellCheck.Core.Analysis;
using CellCheck.Core.Calibration;
using CellCheck.Core.Planning;
using Spectre.Console;

namespace CellCheck.IO.Reports;

/// <summary>The terminal block of replicates each single check needs to catch its departure at the target rate.</summary>
internal static class PlanChecksSection
{
    public static void Write(IAnsiConsole console, DesignPlan plan)
    {
        var q = plan.Request;
        console.Write(new Rule("Assumption checks") { Justification = Justify.Left });
        console.Write(new Text($"Replicates per cell each check needs to catch its departure {PlanText.Percent(q.CheckPower)} of the time (normality "
            + $"checks: one lognormal cell, shape 0.5; spread checks: one cell with 4 times the variance) in {NumberText.Count(plan.Design.Cells)} balanced cells (cell-means residuals; {NumberText.Count(q.Draws)} simulated data sets per size, "
            + $"seeded; a Monte Carlo estimate, good to a replicate or two; searched up to {NumberText.Count(SensitivityPlanner.SearchLimit)}).\n"));
        var table = new Table().Border(TableBorder.Minimal);
        table.AddColumn("check");
        table.AddColumn("where");
        table.AddColumn(new TableColumn("replicates").RightAligned());
        table.AddColumn(new TableColumn("catches there").RightAligned());
        table.AddColumn(new TableColumn("one fewer").RightAligned());
        foreach (var c in plan.Checks)
        {
            table.AddRow(
                TerminalReportWriter.Plain(c.Check),
                TerminalReportWriter.Plain(c.Scope),
                TerminalReportWriter.Plain(c.Needed is { } n ? NumberText.Count(n) : "over " + NumberText.Count(SensitivityPlanner.SearchLimit)),
                TerminalReportWriter.Plain(c.Needed is not null && c.AtNeeded is { } a ? PlanText.Percent(a.Rate)
                    : c.AtNeeded is { } l ? PlanText.Percent(l.Rate) + " at " + NumberText.Count(SensitivityPlanner.SearchLimit) : "-"),
                TerminalReportWriter.Plain(c.BelowNeeded is { } b ? PlanText.Percent(b.Rate) : "-"));
        }

        console.Write(table);
        Best(console, plan, Departure.Lognormal, "a lognormal cell (shape 0.5)");
        Best(console, plan, Departure.VarianceRatio4, "a 4:1 variance ratio in one cell");
    }

    private static void Best(IAnsiConsole console, DesignPlan plan, Departure departure, string what)
    {
        var best = plan.Checks.Where(c => c.Departure == departure && c.Needed is not null).MinBy(c => c.Needed);
        console.Write(new Text(best is null
            ? $"No check catches {what} {PlanText.Percent(plan.Request.CheckPower)} of the time with up to {NumberText.Count(SensitivityPlanner.SearchLimit)} replicates per cell.\n"
            : $"To catch {what} {PlanText.Percent(plan.Request.CheckPower)} of the time takes about {NumberText.Count(best.Needed!.Value)} replicates per cell "
              + $"({best.Check}, {best.Scope}).\n"));
    }
}
