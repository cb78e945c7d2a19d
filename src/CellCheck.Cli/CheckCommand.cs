using System.CommandLine;
using CellCheck.Core.Statistics;
using CellCheck.IO;
using CellCheck.IO.Design;
using CellCheck.IO.Plots;
using CellCheck.IO.Reports;

namespace CellCheck.Cli;

/// <summary>The <c>check</c> command: reads a design, runs every check, prints the summary and writes reports.</summary>
internal static class CheckCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var design = new Argument<string>("design") { Description = "The design file (YAML) naming the data file, factors and responses." };
        var json = new Option<string?>("--json") { Description = "Write the JSON report to FILE.", HelpName = "FILE" };
        var outDir = new Option<string?>("--out") { Description = "Write every report (report.json, diagnostics.csv, pictures) into folder DIR, creating it if needed.", HelpName = "DIR" };
        var dpi = new Option<int?>("--dpi") { Description = "Resolution of the PNG pictures written with --out (default 150).", HelpName = "N" };
        var noPictures = new Option<bool>("--no-pictures") { Description = "With --out, write no pictures (PNG and SVG)." };
        var adjust = new Option<string?>("--adjust") { Description = "Adjustment of within-cell p-values across cells: holm (default), bh or none.", HelpName = "METHOD" };
        adjust.AcceptOnlyFromAmong("holm", "bh", "none");
        var alpha = new Option<double?>("--alpha") { Description = "Significance level (overrides the design file; default 0.05).", HelpName = "A" };
        var quiet = new Option<bool>("--quiet") { Description = "Print only the verdict lines, not the tables." };
        var command = new Command("check", "Check the assumptions of an ANOVA for every response of a design.\n" + ExitCodes.HelpText)
        {
            design, json, outDir, dpi, noPictures, adjust, alpha, quiet,
        };
        command.Options.Add(new VersionOption());
        command.SetAction(parse =>
        {
            var a = parse.GetValue(alpha);
            if (a is { } value && (value <= 0 || value > 0.5))
            {
                error.WriteLine("error [usage] --alpha must be above 0 and at most 0.5.");
                return ExitCodes.BadInput;
            }

            var resolution = parse.GetValue(dpi) ?? PlotRenderer.DefaultDpi;
            if (resolution < PlotRenderer.MinDpi || resolution > PlotRenderer.MaxDpi)
            {
                error.WriteLine($"error [usage] --dpi must be between {PlotRenderer.MinDpi} and {PlotRenderer.MaxDpi}.");
                return ExitCodes.BadInput;
            }

            var method = parse.GetValue(adjust) is { } text ? DesignReader.ParseAdjust(text) : (AdjustMethod?)null;
            var run = CheckRun.Run(parse.GetValue(design)!, method, a);
            if (!run.Ok)
            {
                return ProblemPrinter.Print(run.Problems, error);
            }

            var report = run.Value!.Report;
            if (parse.GetValue(quiet))
            {
                foreach (var r in report.Responses)
                {
                    output.WriteLine($"{r.Response}: {StatusWords.Of(r.Verdict.Status)}");
                }
            }
            else
            {
                TerminalReportWriter.Write(report, output, ToolVersion.Text);
            }

            var pictures = parse.GetValue(noPictures) ? (int?)null : resolution;
            var written = ReportOutputs.Write(run.Value, parse.GetValue(json), parse.GetValue(outDir), pictures, output, error);
            if (written != 0)
            {
                return written;
            }

            return report.AnyFlag ? ExitCodes.Flagged : ExitCodes.Clean;
        });
        return command;
    }
}
