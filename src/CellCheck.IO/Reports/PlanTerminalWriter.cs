using CellCheck.Core.Analysis;
using CellCheck.IO.Planning;
using Spectre.Console;

namespace CellCheck.IO.Reports;

/// <summary>
/// Writes a plan for a person: the balanced design planned for and what was asked, per response the within-cell SD
/// and a table of every term's power now and the replicates per cell it needs, then the replicates each single check
/// needs to see its departure. Fits 100 columns; text from the user's files is never read as markup.
/// </summary>
public static class PlanTerminalWriter
{
    public static void Write(PlanRunResult run, TextWriter writer, string toolVersion, int width = 100)
    {
        ArgumentNullException.ThrowIfNull(run);
        ArgumentNullException.ThrowIfNull(writer);
        using var buffer = new StringWriter(System.Globalization.CultureInfo.InvariantCulture);
        var console = AnsiConsole.Create(new AnsiConsoleSettings
        {
            Ansi = AnsiSupport.No,
            ColorSystem = ColorSystemSupport.NoColors,
            Interactive = InteractionSupport.No,
            Out = new AnsiConsoleOutput(buffer),
        });
        console.Profile.Width = width;
        var plan = run.Plan;
        var d = plan.Design;
        var q = plan.Request;
        console.Write(new Text($"cellcheck {toolVersion} plan | design {run.Design.Path}\n"));
        console.Write(new Text($"data {run.Design.DataText}\n"));
        console.Write(new Text($"Planned design: {PlanText.Layout(d)}, balanced; model {string.Join(" + ", d.Terms.Select(d.TermName))}"
            + (d.Blocked ? "; each replicate one complete block" : string.Empty) + ".\n"));
        console.Write(new Text($"alpha {NumberText.Value(q.Alpha)} | target power {NumberText.Fixed(q.Power, 2)} | smallest effect: {PlanText.Effect(q.Effect)}\n"));
        console.Write(new Text("The effect is placed in the " + plan.Configuration + ".\n"));
        foreach (var r in plan.Responses)
        {
            console.WriteLine();
            PlanResponseSection.Write(console, r, plan);
        }

        console.WriteLine();
        PlanChecksSection.Write(console, plan);
        console.WriteLine();
        console.Write(new Text(PlanText.Caution + "\n"));
        foreach (var line in buffer.ToString().TrimEnd().Split('\n'))
        {
            writer.Write(line.TrimEnd());
            writer.Write('\n');
        }
    }
}
