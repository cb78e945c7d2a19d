using System.Diagnostics;
using System.Globalization;
using CellCheck.IO.Data;
using CellCheck.IO.Design;

namespace CellCheck.Benchmarks;

/// <summary>Times the parts of reading a design's data: the encoding scan alone, the read on one thread, the read in
/// two ranges on two threads and the read in ranges as the tool reads (each beside the scan, as the tool runs it), each
/// with processor time.</summary>
internal static class ReadTiming
{
    /// <param name="warmUp">A small design read first (compiling the reader), or null: then the first read pays for
    /// compilation as the tool does; a warm first read that is still slower than the next one pays for fresh memory.</param>
    public static void Run(string designPath, string? warmUp)
    {
        if (warmUp is not null)
        {
            Time("warm-up", () => DataReader.Read(DesignReader.Read(warmUp).Value!));
        }

        var file = DesignReader.Read(designPath).Value!;
        if (Environment.GetEnvironmentVariable("PRETOUCH") is not null)
        {
            Time("pretouch", () => { var a = new byte[1 << 30]; for (var i = 0; i < a.Length; i += 4096) { a[i] = 1; } return null; });
        }

        Time("read as the tool", () => DataReader.Read(file)); // first: with the compilation a run of the tool pays
        Time("read again", () => DataReader.Read(file));
        Time("encoding scan", () => TableOpener.ScanText(file.DataPath));
        Time("read, one thread", () => DataReader.Read(file, long.MaxValue));
        Time("read, two ranges", () => DataReader.Read(file, DataReader.SplitBytes, 2, 2));
        Time("read, ranges", () => DataReader.Read(file, DataReader.SplitBytes)); // as the tool: RangesPerThread a processor
    }

    private static void Time(string what, Func<object?> step)
    {
        GC.Collect();
        var cpu = Process.GetCurrentProcess().TotalProcessorTime;
        var clock = Stopwatch.StartNew();
        var kept = step();
        var wall = clock.Elapsed.TotalSeconds;
        var used = (Process.GetCurrentProcess().TotalProcessorTime - cpu).TotalSeconds;
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{what,-18} {wall,7:F3} s  (CPU {used,6:F2} s, collections {GC.CollectionCount(0)}/{GC.CollectionCount(1)}/{GC.CollectionCount(2)}, pauses {GC.GetTotalPauseDuration().TotalSeconds:F2} s)"));
        GC.KeepAlive(kept);
    }
}
