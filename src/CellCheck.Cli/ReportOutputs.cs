using CellCheck.IO;
using CellCheck.IO.Plots;
using CellCheck.IO.Reports;

namespace CellCheck.Cli;

/// <summary>Writes the report files a user asked for, atomically, never over an input.</summary>
internal static class ReportOutputs
{
    /// <param name="pictureDpi">With <paramref name="outDir"/>, the PNG resolution of the pictures; null writes none.</param>
    public static int Write(CheckRunResult run, string? json, string? outDir, int? pictureDpi, TextWriter output, TextWriter error)
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

        foreach (var target in targets)
        {
            var problem = AtomicFile.Write(target, inputs, s => JsonReportWriter.Write(run.Report, s, ToolVersion.Text));
            if (problem is not null)
            {
                return ProblemPrinter.Print([problem], error);
            }

            output.WriteLine("Wrote " + target);
        }

        if (outDir is not null && pictureDpi is { } dpi)
        {
            var (pictures, problem) = PictureFiles.Write(run.Report, outDir, inputs, dpi);
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
