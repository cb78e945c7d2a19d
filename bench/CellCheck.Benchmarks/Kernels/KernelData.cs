using CellCheck.Core.Statistics;

namespace CellCheck.Benchmarks.Kernels;

/// <summary>Seeded inputs of the kernel benchmarks: normal samples, grouped values and cell-coded rows.</summary>
internal static class KernelData
{
    public const int Seed = 24680;

    /// <summary><paramref name="n"/> standard normal draws.</summary>
    public static double[] Normal(int n, int seed = Seed)
    {
        var normal = new Gaussian(new Random(seed));
        var x = new double[n];
        for (var i = 0; i < n; i++)
        {
            x[i] = normal.Next();
        }

        return x;
    }

    /// <summary><paramref name="groups"/> groups of <paramref name="size"/> values: group mean uniform on 0..20, SD uniform on 0.5..1.5.</summary>
    public static GroupedValues Groups(int groups, int size)
    {
        var random = new Random(Seed);
        var normal = new Gaussian(random);
        var values = new double[groups * size];
        var starts = new int[groups + 1];
        for (var g = 0; g < groups; g++)
        {
            var mean = 20 * random.NextDouble();
            var sd = 0.5 + random.NextDouble();
            for (var i = 0; i < size; i++)
            {
                values[(g * size) + i] = mean + (sd * normal.Next());
            }

            starts[g + 1] = (g + 1) * size;
        }

        return new GroupedValues(values, starts);
    }
}
