using System.Diagnostics;
using System.Globalization;
using CellCheck.Core.Plots;
using CellCheck.IO;
using CellCheck.IO.Html;
using CellCheck.IO.Plots;
using CellCheck.IO.Reports;

namespace CellCheck.Benchmarks;

/// <summary>Times each report output of one check on a design (the files <c>--out</c> writes), each with processor
/// time, allocation and the peak resident set of its step; the files go to a scratch folder that is removed after.</summary>
internal static class OutputTiming
{
    public static void Run(string designPath)
    {
        var folder = Directory.CreateTempSubdirectory("cellcheck-outputs-").FullName;
        try
        {
            CheckRunResult run = null!;
            Time("check", () => run = CheckRun.Run(designPath).Value!);
            var report = run.Report;
            Time("diagnostics.csv", () => Write(folder, "diagnostics.csv", s => DiagnosticsCsvWriter.Write(report, s)));
            Time("report.json", () => Write(folder, "report.json", s => JsonReportWriter.Write(report, s, "bench")));
            IReadOnlyList<ResponsePictures> pictures = null!;
            Time("plot models", () => pictures = ResponsePlots.Build(report));
            Time("png", () =>
            {
                foreach (var p in pictures)
                {
                    Write(folder, "cells.png", s => PlotRenderer.WritePng(p.Cells, s, PlotRenderer.DefaultDpi));
                    Write(folder, "pooled.png", s => PlotRenderer.WritePng(p.Pooled, s, PlotRenderer.DefaultDpi));
                }
            });
            Time("svg", () =>
            {
                foreach (var p in pictures)
                {
                    Write(folder, "cells.svg", s => PlotRenderer.WriteSvg(p.Cells, s));
                    Write(folder, "pooled.svg", s => PlotRenderer.WriteSvg(p.Pooled, s));
                }
            });
            Time("picture files", () => PictureFiles.Write(pictures, folder, [], PlotRenderer.DefaultDpi));
            Time("html page", () =>
            {
                var context = new HtmlContext("0", DateTimeOffset.UnixEpoch, "bench") { Pictures = HtmlPictures.For(report) };
                var page = HtmlReportWriter.Render(report, context);
                Write(folder, "report.html", s => s.Write(System.Text.Encoding.UTF8.GetBytes(page)));
            });
        }
        finally
        {
            Directory.Delete(folder, true);
        }
    }

    private static void Write(string folder, string name, Action<Stream> write)
    {
        using var stream = File.Create(Path.Combine(folder, name));
        write(stream);
    }

    private static void Time(string what, Action step)
    {
        GC.Collect();
        Phases.ResetPeak();
        var allocated = GC.GetTotalAllocatedBytes();
        var cpu = Process.GetCurrentProcess().TotalProcessorTime;
        var clock = Stopwatch.StartNew();
        step();
        var wall = clock.Elapsed.TotalSeconds;
        var used = (Process.GetCurrentProcess().TotalProcessorTime - cpu).TotalSeconds;
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"{what,-16} {wall,7:F3} s  (CPU {used,6:F2} s, allocated {(GC.GetTotalAllocatedBytes() - allocated) / 1e6,6:F0} MB, step peak {Phases.PhasePeak() / 1e6,6:F0} MB)"));
    }
}
