using System.CommandLine;
using CellCheck.Core.Analysis;
using CellCheck.Core.Remedies;
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
        var html = new Option<string?>("--html") { Description = "Write the self-contained HTML report to FILE.", HelpName = "FILE" };
        var outDir = new Option<string?>("--out") { Description = "Write every report (report.json, report.html, diagnostics.csv, pictures) into folder DIR, creating it if needed.", HelpName = "DIR" };
        var dpi = new Option<int?>("--dpi") { Description = "Resolution of the PNG pictures written with --out (default 150).", HelpName = "N" };
        var noPictures = new Option<bool>("--no-pictures") { Description = "With --out, write no pictures (PNG and SVG)." };
        var adjust = new Option<string?>("--adjust") { Description = "Adjustment of within-cell p-values across cells: holm (default), bh or none.", HelpName = "METHOD" };
        adjust.AcceptOnlyFromAmong("holm", "bh", "none");
        var alpha = new Option<double?>("--alpha") { Description = "Significance level (overrides the design file; default 0.05).", HelpName = "A" };
        var quiet = new Option<bool>("--quiet") { Description = "Print only the verdict lines, not the tables." };
        var transform = new Option<string?>("--transform") { Description = TransformHelp, HelpName = "auto|log|sqrt|reciprocal|power:P|yeo-johnson" };
        var shift = new Option<double?>("--shift") { Description = "Add C to every response value before the transformation (stated in the report; never done unless asked).", HelpName = "C" };
        var sensitivityDraws = new Option<int?>("--sensitivity-draws") { Description = "Simulated data sets per scenario for the checks' sensitivity table (default 400).", HelpName = "N" };
        var command = new Command("check", "Check the assumptions of an ANOVA for every response of a design.\n" + ExitCodes.HelpText)
        {
            design, json, html, outDir, dpi, noPictures, adjust, alpha, quiet, transform, shift, sensitivityDraws,
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

            if (parse.GetValue(sensitivityDraws) is < 10)
            {
                error.WriteLine("error [usage] --sensitivity-draws must be at least 10.");
                return ExitCodes.BadInput;
            }

            var method = parse.GetValue(adjust) is { } text ? DesignReader.ParseAdjust(text) : (AdjustMethod?)null;
            var request = TransformOption(parse.GetValue(transform), parse.GetValue(shift), error, out var failed);
            if (failed != 0)
            {
                return failed;
            }

            var run = CheckRun.Run(parse.GetValue(design)!, method, a, request, parse.GetValue(sensitivityDraws));
            if (!run.Ok)
            {
                return ProblemPrinter.Print(run.Problems, error);
            }

            var report = run.Value!.Report;
            if (parse.GetValue(quiet))
            {
                foreach (var r in report.Responses)
                {
                    var after = r.Remedy is { After: { } t, Applied: { } applied } ? $" (after {applied.Name}: {StatusWords.Of(t.Verdict.Status)})" : string.Empty;
                    output.WriteLine($"{r.Response}: {StatusWords.Of(r.Verdict.Status)}{after}");
                }
            }
            else
            {
                TerminalReportWriter.Write(report, output, ToolVersion.Text);
            }

            var pictures = parse.GetValue(noPictures) ? (int?)null : resolution;
            var written = ReportOutputs.Write(run.Value, parse.GetValue(json), parse.GetValue(outDir), pictures, output, error, parse.GetValue(html));
            if (written != 0)
            {
                return written;
            }

            return report.Responses.Any(r => RemedyStatus.Of(r) == CheckStatus.Flag) ? ExitCodes.Flagged : ExitCodes.Clean;
        });
        return command;
    }

    private const string TransformHelp = "Re-run every check on a transformed response and show before and after: auto (the recommended "
        + "power), log, sqrt, reciprocal, reciprocal-sqrt, power:P, yeo-johnson or yeo-johnson:P. The exit code then follows the "
        + "transformed response's verdict. Without it the report still recommends a transformation.";

    private static TransformRequest? TransformOption(string? text, double? shift, TextWriter error, out int failed)
    {
        failed = 0;
        if (text is null)
        {
            if (shift is not null)
            {
                failed = ProblemPrinter.Print([TransformParser.ShiftWithoutTransform()], error);
            }

            return null;
        }

        var parsed = TransformParser.Parse(text, shift);
        if (!parsed.Ok)
        {
            failed = ProblemPrinter.Print(parsed.Problems, error);
        }

        return parsed.Value;
    }
}
