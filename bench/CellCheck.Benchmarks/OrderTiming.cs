using System.Diagnostics;
using System.Globalization;
using CellCheck.Core.Data;
using CellCheck.Core.Order;

namespace CellCheck.Benchmarks;

/// <summary>Times the Durbin-Watson moment kernels on a synthetic run sequence shaped like the screen data
/// (cells at random, day blocks in run order): <c>dw ROWS CELLS</c>; and the single-sequence order kernels on
/// ROWS normal values: <c>order ROWS</c>.</summary>
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
            _ = CellBlockDurbinWatson.Test(e, cell, cells, [LevelCodes.From(dummy, days - 1)], days - 1);
            var blocked = clock.Elapsed.TotalSeconds;
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"grouped moments {grouped:F3} s, blocked test {blocked:F3} s"));
        }
    }

    public static void Kernels(int rows)
    {
        var normal = new Gaussian(new Random(ScreenData.Seed));
        var e = new double[rows];
        var t = new double[rows];
        for (var i = 0; i < rows; i++)
        {
            e[i] = normal.Next();
            t[i] = i + 1;
        }

        for (var round = 0; round < 2; round++)
        {
            var clock = Stopwatch.StartNew();
            _ = Core.Statistics.Descriptive.Median(e);
            var median = clock.Elapsed.TotalSeconds;
            clock.Restart();
            _ = RunsTest.Test(e);
            var runs = clock.Elapsed.TotalSeconds;
            clock.Restart();
            _ = OrderTrend.Test(e, t);
            var trend = clock.Elapsed.TotalSeconds;
            clock.Restart();
            _ = DurbinWatson.Statistic(e);
            var d = clock.Elapsed.TotalSeconds;
            clock.Restart();
            _ = LagCorrelation.Lag1(e);
            var lag = clock.Elapsed.TotalSeconds;
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"median {median:F3} s, runs {runs:F3} s, trend {trend:F3} s, d {d:F3} s, lag-1 {lag:F3} s"));
        }
    }
}
