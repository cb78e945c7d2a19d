using System.CommandLine;
using CellCheck.IO.Planning;
using CellCheck.IO.Reports;

namespace CellCheck.Cli;

/// <summary>The <c>plan</c> command: power of every term's F test for a smallest effect, and the replicates the next run needs.</summary>
internal static class PlanCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var design = new Argument<string>("design") { Description = "The design file (YAML) naming the data file, factors, responses and model." };
        var effect = new Option<string?>("--effect") { Description = "Smallest effect worth detecting: a difference between means in the response's unit (0.5) or Cohen's f (f=0.25). Required.", HelpName = "X" };
        var sd = new Option<double?>("--sd") { Description = "Within-cell standard deviation (default: the pooled residual SD of the data).", HelpName = "S" };
        var power = new Option<double>("--power") { Description = "Target power of each term's F test.", DefaultValueFactory = _ => 0.8, HelpName = "P" };
        var checkPower = new Option<double?>("--check-power") { Description = "Rate at which each assumption check should catch its departure (default: --power).", HelpName = "P" };
        var alpha = new Option<double?>("--alpha") { Description = "Significance level (overrides the design file; default 0.05).", HelpName = "A" };
        var response = new Option<string[]>("--response") { Description = "Plan only this response (repeatable; default: all).", HelpName = "NAME" };
        var draws = new Option<int>("--draws") { Description = "Simulated data sets per size for the checks' replicates.", DefaultValueFactory = _ => 200, HelpName = "N" };
        var json = new Option<string?>("--json") { Description = "Write the plan as JSON to FILE.", HelpName = "FILE" };
        var command = new Command("plan", "Plan the next run: power of every term's F test for a smallest effect of interest, the replicates per cell "
            + "it needs, and the replicates the assumption checks need to see a skewed cell or a 4:1 variance ratio.\n"
            + "Exit codes: 0 = planned; 2 = bad input or usage; 3 = internal error (please report it).")
        {
            design, effect, sd, power, checkPower, alpha, response, draws, json,
        };
        command.Options.Add(new VersionOption());
        command.SetAction(parse =>
        {
            var args = new PlanArguments(parse.GetValue(effect), parse.GetValue(sd), parse.GetValue(power), parse.GetValue(checkPower),
                parse.GetValue(alpha), parse.GetValue(response) ?? [], parse.GetValue(draws));
            var run = PlanRun.Run(parse.GetValue(design)!, args);
            if (!run.Ok)
            {
                return ProblemPrinter.Print(run.Problems, error);
            }

            PlanTerminalWriter.Write(run.Value!, output, ToolVersion.Text);
            if (parse.GetValue(json) is { } path)
            {
                var problem = AtomicFile.Write(path, [run.Value!.Design.Path, run.Value.Design.DataPath], s => PlanJsonWriter.Write(run.Value, s, ToolVersion.Text));
                if (problem is not null)
                {
                    return ProblemPrinter.Print([problem], error);
                }

                output.WriteLine("Wrote " + path);
            }

            return ExitCodes.Clean;
        });
        return command;
    }
}
