using System.Diagnostics;
using System.Globalization;
using CellCheck.Core.Statistics;

namespace CellCheck.Benchmarks;

/// <summary>Times the pooled normality kernels, in the order the pooled checks run them, on seeded standard normal
/// values: <c>pooled ROWS</c>.</summary>
internal static class PooledTiming
{
    public static void Run(int rows)
    {
        var normal = new Gaussian(new Random(ScreenData.Seed));
        var source = new double[rows];
        for (var i = 0; i < rows; i++)
        {
            source[i] = normal.Next();
        }

        for (var round = 0; round < 2; round++)
        {
            var values = (double[])source.Clone();
            var clock = Stopwatch.StartNew();
            var parts = new List<string>();
            void Mark(string what)
            {
                parts.Add(string.Create(CultureInfo.InvariantCulture, $"{what} {clock.Elapsed.TotalSeconds:F3}"));
                clock.Restart();
            }

            RadixSort.Sort(values, values.Length);
            Mark("sort");
            _ = Moments.Summarize(values);
            Mark("moments");
            _ = ShapiroWilk.TestSorted(values);
            Mark("shapiro-wilk");
            _ = DagostinoPearson.Test(values);
            Mark("dagostino");
            _ = AndersonDarling.TestSortedInPlace(values);
            Mark("anderson-darling");
            Console.WriteLine(string.Join(", ", parts) + " (s)");
        }
    }
}
