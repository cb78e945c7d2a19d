using System.CommandLine;
using System.Text;
using CellCheck.Core.Calibration;
using CellCheck.IO.Reports;

namespace CellCheck.Cli;

/// <summary>The <c>calibrate</c> command: runs the verdict over the standard grid of designs and writes the table.</summary>
internal static class CalibrateCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var draws = new Option<int>("--draws") { Description = "Simulated data sets per design and scenario.", DefaultValueFactory = _ => 1000, HelpName = "N" };
        var nullDraws = new Option<int>("--null-draws") { Description = "Null draws for the Monte Carlo p-values.", DefaultValueFactory = _ => 9999, HelpName = "N" };
        var alpha = new Option<double>("--alpha") { Description = "Significance level.", DefaultValueFactory = _ => 0.05, HelpName = "A" };
        var outFile = new Option<string?>("--out") { Description = "Write the Markdown table to FILE (default: print it).", HelpName = "FILE" };
        var command = new Command("calibrate", "Measure the verdict's false-alarm rate and power over a grid of designs (a benchmark, minutes).\n" + ExitCodes.HelpText)
        {
            draws, nullDraws, alpha, outFile,
        };
        command.Options.Add(new VersionOption());
        command.SetAction(parse =>
        {
            var a = parse.GetValue(alpha);
            var settings = new CalibrationSettings(NullDraws: parse.GetValue(nullDraws), ScenarioDraws: parse.GetValue(draws));
            if (settings.NullDraws < 99 || settings.ScenarioDraws < 10 || a <= 0 || a > 0.5)
            {
                error.WriteLine("error [usage] --null-draws must be at least 99, --draws at least 10, --alpha in (0, 0.5].");
                return ExitCodes.BadInput;
            }

            var rows = new List<GridRow>();
            foreach (var design in CalibrationGrid.Standard())
            {
                rows.Add(CalibrationGrid.Run(design, a, settings));
                error.WriteLine("calibrated " + design.Label);
            }

            var text = new StringWriter(System.Globalization.CultureInfo.InvariantCulture);
            CalibrationTableWriter.Write(rows, a, settings, ToolVersion.Text, text);
            if (parse.GetValue(outFile) is { } path)
            {
                var problem = AtomicFile.Write(path, [], s => s.Write(Encoding.UTF8.GetBytes(text.ToString())));
                return problem is null ? ExitCodes.Clean : ProblemPrinter.Print([problem], error);
            }

            output.Write(text.ToString());
            return ExitCodes.Clean;
        });
        return command;
    }
}
