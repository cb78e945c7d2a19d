using System.Diagnostics;
using System.Globalization;
using CellCheck.Core.Cells;
using CellCheck.Core.Remedies;
using CellCheck.Core.Residuals;
using CellCheck.IO.Data;
using CellCheck.IO.Design;

namespace CellCheck.Benchmarks;

/// <summary>Times the parts of the Box-Cox fit of the blocked model on a design: the setting organisation, the
/// power-sum table, one profile evaluation, the whole fit and the remedy fits step, each a few times.</summary>
internal static class BoxCoxTiming
{
    public static void Run(string designPath, int repeats)
    {
        var file = DesignReader.Read(designPath).Value!;
        var data = DataReader.Read(file).Value!;
        var spec = ModelSpecs.From(file);
        var column = data.Responses[0];
        var partition = CellPartition.Build(data.Factors, column.Values, data.Blocks);
        var residuals = ResidualSources.For(data, spec, "model").Compute(partition);
        var fitted = residuals.Diagnostics!.Model;
        var values = partition.Values.Values;
        var y = new double[values.Length];
        for (var i = 0; i < y.Length; i++)
        {
            y[i] = column.Origin + values[i];
        }

        for (var r = 0; r < repeats; r++)
        {
            var rss = Time("setting groups", () => RemedyAnalyzer.Model(data, spec, partition, fitted));
            var settings = (SettingRss)rss;
            Time("rss of y", () => rss.Of(y));
            var logs = Array.ConvertAll(settings.Order.Permutation(), i => Math.Log(y[i]));
            var table = new PowerSumTable(settings.Starts, new HeldLogs(logs));
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"{table.Groups} groups, mean size {table.Size.Average():F1}, series terms kept {table.Terms.Average():F1} on average, {table.Stored} power sums stored"));
            var sums = Time("power sums", () => new GroupedPowerSums(settings.Starts, logs, settings.Between));
            Time("power sums from y", () => new GroupedPowerSums(settings.Starts, new SettingLogs<ShiftedValues>(new ShiftedValues(y, 0), settings.Order), settings.Between));
            Time("41 evaluations", () => Enumerable.Range(0, 41).Sum(k => sums.LogLikelihood(-5 + (k * 0.25))));
            Time("box-cox fit", () => BoxCox.Fit(rss, y, fitted.Name, 0));
            Time("remedy fits", () => RemedyFits.Compute(data, spec, partition, fitted, column, 0, false));
        }
    }

    private static T Time<T>(string label, Func<T> work)
    {
        GC.Collect();
        var allocated = GC.GetTotalAllocatedBytes(true);
        var cpu = Process.GetCurrentProcess().TotalProcessorTime.TotalSeconds;
        var clock = Stopwatch.StartNew();
        var result = work();
        var wall = clock.Elapsed.TotalSeconds;
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"{label,-16} {wall,7:F3} s  (CPU {Process.GetCurrentProcess().TotalProcessorTime.TotalSeconds - cpu,6:F2} s, allocated {(GC.GetTotalAllocatedBytes(true) - allocated) / 1e6,6:F0} MB)"));
        return result;
    }
}
