using CellCheck.Core.Plots;
using CellCheck.IO;
using CellCheck.IO.Html;
using CellCheck.IO.Plots;
using CellCheck.IO.Reports;

namespace CellCheck.Cli;

/// <summary>Writes the report files a user asked for, atomically, never over an input.</summary>
internal static class ReportOutputs
{
    /// <param name="pictureDpi">With <paramref name="outDir"/>, the PNG resolution of the pictures; null writes none.</param>
    public static int Write(CheckRunResult run, string? json, string? outDir, int? pictureDpi, TextWriter output, TextWriter error, string? html = null)
    {
        var targets = new List<string>();
        if (json is not null)
        {
            targets.Add(json);
        }

        if (outDir is not null)
        {
            targets.Add(Path.Combine(outDir, "report.json"));
        }

        string[] inputs = [run.Design.Path, run.Design.DataPath];
        if (outDir is not null)
        {
            var csv = Path.Combine(outDir, "diagnostics.csv");
            var problem = AtomicFile.Write(csv, inputs, s => DiagnosticsCsvWriter.Write(run.Report, s));
            if (problem is not null)
            {
                return ProblemPrinter.Print([problem], error);
            }

            output.WriteLine("Wrote " + csv);
        }

        var pages = new List<string>();
        if (html is not null)
        {
            pages.Add(html);
        }

        if (outDir is not null)
        {
            pages.Add(Path.Combine(outDir, "report.html"));
        }

        // the plot models are built once for the page and the picture files (at ten million rows each build sorts them)
        var plots = pages.Count > 0 || (outDir is not null && pictureDpi is not null) ? ResponsePlots.Build(run.Report) : null;
        if (pages.Count > 0)
        {
            var context = new HtmlContext(FileDigest.Sha256(run.Design.DataPath), DateTimeOffset.UtcNow, ToolVersion.Text)
            {
                Pictures = HtmlPictures.For(run.Report, plots!),
            };
            var page = System.Text.Encoding.UTF8.GetBytes(HtmlReportWriter.Render(run.Report, context));
            foreach (var target in pages)
            {
                var problem = AtomicFile.Write(target, inputs, s => s.Write(page));
                if (problem is not null)
                {
                    return ProblemPrinter.Print([problem], error);
                }

                output.WriteLine("Wrote " + target);
            }
        }

        foreach (var target in targets)
        {
            var problem = AtomicFile.Write(target, inputs, s => JsonReportWriter.Write(run.Report, s, ToolVersion.Text));
            if (problem is not null)
            {
                return ProblemPrinter.Print([problem], error);
            }

            output.WriteLine("Wrote " + target);
        }

        if (plots is not null && outDir is not null && pictureDpi is { } dpi)
        {
            var (pictures, problem) = PictureFiles.Write(plots, outDir, inputs, dpi);
            foreach (var path in pictures)
            {
                output.WriteLine("Wrote " + path);
            }

            if (problem is not null)
            {
                return ProblemPrinter.Print([problem], error);
            }
        }

        return 0;
    }
}
