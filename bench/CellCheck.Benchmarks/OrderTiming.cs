using System.Diagnostics;
using System.Globalization;
using CellCheck.Core.Order;

namespace CellCheck.Benchmarks;

/// <summary>Times the Durbin-Watson moment kernels on a synthetic run sequence shaped like the screen data
/// (cells at random, day blocks in run order): <c>dw ROWS CELLS</c>.</summary>
internal static class OrderTiming
{
    public static void Run(int rows, int cells)
    {
        const int days = 20;
        var random = new Random(ScreenData.Seed);
        var cell = new int[rows];
        var dummy = new int[rows];
        var e = new double[rows];
        var normal = new Gaussian(random);
        for (var t = 0; t < rows; t++)
        {
            cell[t] = random.Next(cells);
            dummy[t] = (int)((long)t * days / rows) - 1;
            e[t] = normal.Next();
        }

        for (var round = 0; round < 2; round++)
        {
            var clock = Stopwatch.StartNew();
            _ = GroupedDurbinWatson.Moments(cell, cells);
            var grouped = clock.Elapsed.TotalSeconds;
            clock.Restart();
            _ = CellBlockDurbinWatson.Test(e, cell, cells, [dummy], days - 1);
            var blocked = clock.Elapsed.TotalSeconds;
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"grouped moments {grouped:F3} s, blocked test {blocked:F3} s"));
        }
    }
}
