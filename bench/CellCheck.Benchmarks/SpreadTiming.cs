using System.Diagnostics;
using System.Globalization;
using CellCheck.Core.Statistics;

namespace CellCheck.Benchmarks;

/// <summary>Times the spread tests computed together and each alone, with what each allocates, on seeded groups of
/// normal values rounded to three decimals (so deviations tie): <c>spread ROWS CELLS</c>.</summary>
internal static class SpreadTiming
{
    public static void Run(int rows, int cells)
    {
        var random = new Random(ScreenData.Seed);
        var normal = new Gaussian(random);
        var starts = new int[cells + 1];
        for (var c = 0; c < cells; c++)
        {
            starts[c + 1] = (int)((long)rows * (c + 1) / cells);
        }

        var values = new double[rows];
        for (var i = 0; i < rows; i++)
        {
            values[i] = Math.Round(10 + normal.Next(), 3);
        }

        var groups = new GroupedValues(values, starts);
        SpreadTests[] runs = [SpreadTests.All, SpreadTests.Levene, SpreadTests.BrownForsythe, SpreadTests.BrownForsytheZerosRemoved,
            SpreadTests.Bartlett, SpreadTests.FlignerKilleen];
        for (var round = 0; round < 2; round++)
        {
            foreach (var tests in runs)
            {
                GC.Collect();
                var allocated = GC.GetTotalAllocatedBytes(precise: true);
                var cpu = Process.GetCurrentProcess().TotalProcessorTime;
                var clock = Stopwatch.StartNew();
                _ = SpreadKernel.Run(groups, tests);
                var seconds = clock.Elapsed.TotalSeconds;
                var cpuSeconds = (Process.GetCurrentProcess().TotalProcessorTime - cpu).TotalSeconds;
                var megabytes = (GC.GetTotalAllocatedBytes(precise: true) - allocated) / 1e6;
                Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                    $"{tests,-26} {seconds,7:F3} s  (CPU {cpuSeconds,6:F2} s, allocated {megabytes,6:F0} MB)"));
            }
        }
    }
}
