using System.Globalization;
using BenchmarkDotNet.Running;

namespace CellCheck.Benchmarks;

/// <summary>
/// Benchmark entry point.
/// <c>generate ROWS CELLS DIR</c> writes the seeded screen data and its design;
/// <c>floor FILE</c> times a bare Sep pass over a file (the parse floor);
/// <c>read DESIGN [WARMUP]</c> times the encoding scan and the read on one thread, in two ranges and in ranges as the tool cuts them;
/// <c>pooled ROWS</c> times the pooled normality kernels;
/// <c>boxcox DESIGN [REPEATS]</c> times the parts of the Box-Cox fit of the blocked model;
/// <c>dw ROWS CELLS</c> times the Durbin-Watson moment kernels;
/// <c>spread ROWS CELLS</c> times the spread tests together and each alone;
/// <c>outputs DESIGN</c> times each report output (the files <c>--out</c> writes) after one check;
/// <c>kernels [BenchmarkDotNet arguments]</c> runs the kernel suite.
/// </summary>
internal static class Program
{
    private static int Main(string[] args)
    {
        IO.Platform.HeapPages.Advise(); // as the tool does
        switch (args.FirstOrDefault())
        {
            case "generate" when args.Length == 4:
                var rows = long.Parse(args[1], CultureInfo.InvariantCulture);
                var cells = int.Parse(args[2], CultureInfo.InvariantCulture);
                Directory.CreateDirectory(args[3]);
                var name = $"screen-{Label(rows)}-{cells / 1000}k";
                ScreenData.Write(Path.Combine(args[3], name + ".csv"), rows, cells, days: 20);
                ScreenData.WriteDesign(Path.Combine(args[3], name + ".yaml"), name + ".csv");
                Console.WriteLine(Path.Combine(args[3], name + ".yaml"));
                return 0;
            case "floor" when args.Length == 2:
                var (seconds, count, checksum) = ParseFloor.Run(args[1]);
                Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{seconds:F3} s, {count} rows, checksum {checksum:G6}"));
                return 0;
            case "phases" when args.Length == 2:
                Phases.Run(args[1]);
                return 0;
            case "read" when args.Length is 2 or 3:
                ReadTiming.Run(args[1], args.Length == 3 ? args[2] : null);
                return 0;
            case "pooled" when args.Length == 2:
                PooledTiming.Run(int.Parse(args[1], CultureInfo.InvariantCulture));
                return 0;
            case "boxcox" when args.Length is 2 or 3:
                BoxCoxTiming.Run(args[1], args.Length == 3 ? int.Parse(args[2], CultureInfo.InvariantCulture) : 3);
                return 0;
            case "dw" when args.Length == 3:
                OrderTiming.Run(int.Parse(args[1], CultureInfo.InvariantCulture), int.Parse(args[2], CultureInfo.InvariantCulture));
                return 0;
            case "order" when args.Length == 2:
                OrderTiming.Kernels(int.Parse(args[1], CultureInfo.InvariantCulture));
                return 0;
            case "intern" when args.Length == 2:
                InternTiming.Run(args[1]);
                return 0;
            case "spread" when args.Length == 3:
                SpreadTiming.Run(int.Parse(args[1], CultureInfo.InvariantCulture), int.Parse(args[2], CultureInfo.InvariantCulture));
                return 0;
            case "outputs" when args.Length == 2:
                OutputTiming.Run(args[1]);
                return 0;
            case "kernels":
                BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args[1..]);
                return 0;
            default:
                Console.Error.WriteLine("usage: generate ROWS CELLS DIR | floor FILE | phases DESIGN | read DESIGN [WARMUP] | pooled ROWS | boxcox DESIGN [REPEATS] | dw ROWS CELLS | order ROWS | intern FILE | spread ROWS CELLS | outputs DESIGN | kernels [BenchmarkDotNet arguments]");
                return 2;
        }
    }

    private static string Label(long rows) => rows % 1_000_000 == 0 ? $"{rows / 1_000_000}m" : $"{rows / 1000}k";
}
