using System.Diagnostics;
using System.Globalization;
using CellCheck.Core.Analysis;
using CellCheck.Core.Calibration;
using CellCheck.Core.Cells;
using CellCheck.Core.Remedies;
using CellCheck.Core.Residuals;
using CellCheck.Core.Resolution;
using CellCheck.IO.Data;
using CellCheck.IO.Design;

namespace CellCheck.Benchmarks;

/// <summary>Times each phase of one check run on a design (the steps of ResponseAnalyzer, in its order), for profiling.</summary>
internal static class Phases
{
    public static void Run(string designPath)
    {
        var clock = Stopwatch.StartNew();
        var last = 0.0;
        var allocated = 0L;
        var cpu = 0.0;
        void Mark(string phase)
        {
            var now = clock.Elapsed.TotalSeconds;
            var live = GC.GetTotalMemory(true); // a full collection: the bytes still reachable after this phase
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{phase,-14} {now - last,8:F3} s  (CPU {Process.GetCurrentProcess().TotalProcessorTime.TotalSeconds - cpu,6:F2} s, allocated {(GC.GetTotalAllocatedBytes() - allocated) / 1e6,6:F0} MB, live {live / 1e6,7:F0} MB, peak working set {Process.GetCurrentProcess().PeakWorkingSet64 / 1e6,7:F0} MB, phase peak {PhasePeak() / 1e6,6:F0} MB)"));
            ResetPeak();
            last = clock.Elapsed.TotalSeconds;
            allocated = GC.GetTotalAllocatedBytes();
            cpu = Process.GetCurrentProcess().TotalProcessorTime.TotalSeconds;
        }

        ResetPeak();
        var file = DesignReader.Read(designPath).Value!;
        var data = DataReader.Read(file).Value!;
        Mark("read");
        var options = new AnalysisOptions(file.Alpha, file.Adjust);
        var spec = ModelSpecs.From(file);
        var column = data.Responses[0];
        var partition = column.PartitionBy(data.Factors, data.Blocks); // as the tool does: the column hands its values over
        Mark("partition");
        var census = CensusBuilder.Build(partition);
        Mark("census");
        var source = ResidualSources.For(data, spec, "model");
        var residuals = source.Compute(partition);
        Mark("residuals");
        var cells = CellChecks.Run(partition, residuals, column.Origin, options, column.Name);
        Mark("cells");
        var pooled = PooledChecks.Run(residuals, options.Alpha);
        Mark("pooled");
        var spread = SpreadChecks.Run(partition, residuals, cells, options.Alpha);
        Mark("spread");
        var model = ModelChecks.Run(partition, data.Blocks, spec, residuals, data.SourceLines, options.Alpha);
        Mark("model");
        var calibration = Calibrator.Calibrate(residuals.NullPlan, options.Alpha, options.Simulation);
        Mark("calibration");
        var order = OrderChecks.Run(data, partition, residuals, options.Alpha);
        Mark("order");
        var resolution = RecordingStep.Summarize(partition.Values, column.Decimals, residuals.ResidualSd);
        Mark("resolution");
        _ = PrimaryDecisions.Decide(partition, residuals, pooled, spread, order, calibration, options.Alpha, resolution, options.Simulation);
        Mark("decisions");
        _ = Core.Planning.ReplicatesAssessor.Assess(census, residuals, options);
        Mark("replicates");
        _ = RemedyFits.Compute(data, spec, partition, residuals.Diagnostics!.Model, column, 0, false);
        Mark("remedy fits");
        var report = ResponseAnalyzer.Analyze(data, 0, options, spec);
        Mark("whole again");
        _ = RemedyAnalyzer.Analyze(data, 0, options, spec, report);
        Mark("remedy");
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"GC pauses {GC.GetTotalPauseDuration().TotalSeconds:F2} s, allocated {GC.GetTotalAllocatedBytes() / 1e9:F1} GB, collections gen0 {GC.CollectionCount(0)} gen1 {GC.CollectionCount(1)} gen2 {GC.CollectionCount(2)}, CPU {Process.GetCurrentProcess().TotalProcessorTime.TotalSeconds:F1} s"));
        _ = model;
    }

    /// <summary>The largest resident set since the last <see cref="ResetPeak"/> (VmHWM), or 0 where Linux's status file is missing.</summary>
    internal static long PhasePeak()
    {
        const string status = "/proc/self/status";
        var line = File.Exists(status) ? File.ReadLines(status).FirstOrDefault(l => l.StartsWith("VmHWM:", StringComparison.Ordinal)) : null;
        return line is null ? 0 : 1024 * long.Parse(line.Split(' ', StringSplitOptions.RemoveEmptyEntries)[1], CultureInfo.InvariantCulture);
    }

    /// <summary>Resets the peak resident set to the present one (Linux: "5" into /proc/self/clear_refs), so the next
    /// phase's peak is its own.</summary>
    internal static void ResetPeak()
    {
        try
        {
            File.WriteAllText("/proc/self/clear_refs", "5");
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            // not Linux, or not allowed: the phase peaks are then peaks since the start
        }
    }
}
