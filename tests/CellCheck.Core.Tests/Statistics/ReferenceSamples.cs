namespace CellCheck.Core.Tests.Statistics;

/// <summary>Published samples copied from /work/shared/reference (README.md and data/), with their sources.</summary>
internal static class ReferenceSamples
{
    /// <summary>Royston (1992) Statistics and Computing 2, 117-119, worked example (n = 10).</summary>
    public static readonly double[] Royston1992 = [48.4, 49.0, 59.5, 59.6, 60.7, 88.8, 98.2, 109.4, 169.1, 227.1];

    /// <summary>Weights of 11 men in lb, Shapiro &amp; Wilk (1965) Biometrika 52, 591-611.</summary>
    public static readonly double[] ShapiroWilkWeights = [148, 154, 158, 160, 161, 162, 166, 170, 182, 195, 236];

    /// <summary>The 20-value sample of statsmodels test_statstools.py (test_adnorm, test_omni_normtest).</summary>
    public static readonly double[] Statsmodels20 =
    [
        -0.1184, -1.3403, 0.0063, -0.612, -0.3869, -0.2313, -2.8485, -0.2167, 0.4153, 1.8492,
        -0.3706, 0.9726, -0.1501, -0.0337, -1.4423, 1.2489, 0.9182, -0.2331, -0.6182, 0.183,
    ];

    /// <summary>NIST/SEMATECH e-Handbook GEAR.DAT: 100 gear diameters, 10 batches of 10 in batch order (values as in
    /// scipy's test_morestats.py).</summary>
    public static readonly double[] Gear =
    [
        1.006, 0.996, 0.998, 1.000, 0.992, 0.993, 1.002, 0.999, 0.994, 1.000,
        0.998, 1.006, 1.000, 1.002, 0.997, 0.998, 0.996, 1.000, 1.006, 0.988,
        0.991, 0.987, 0.997, 0.999, 0.995, 0.994, 1.000, 0.999, 0.996, 0.996,
        1.005, 1.002, 0.994, 1.000, 0.995, 0.994, 0.998, 0.996, 1.002, 0.996,
        0.998, 0.998, 0.982, 0.990, 1.002, 0.984, 0.996, 0.993, 0.980, 0.996,
        1.009, 1.013, 1.009, 0.997, 0.988, 1.002, 0.995, 0.998, 0.981, 0.996,
        0.990, 1.004, 0.996, 1.001, 0.998, 1.000, 1.018, 1.010, 0.996, 1.002,
        0.998, 1.000, 1.006, 1.000, 1.002, 0.996, 0.998, 0.996, 1.002, 1.006,
        1.002, 0.998, 0.996, 0.995, 0.996, 1.004, 1.004, 0.998, 0.999, 0.991,
        0.991, 0.995, 0.984, 0.994, 0.997, 0.997, 0.991, 0.998, 1.004, 0.997,
    ];

    /// <summary>Beall (1942) Biometrika 29, 243-262 (R datasets::InsectSprays): insect counts, sprays A-F, 12 each.</summary>
    public static readonly double[] InsectSprays =
    [
        10, 7, 20, 14, 14, 12, 10, 23, 17, 20, 14, 13,
        11, 17, 21, 11, 16, 14, 17, 17, 19, 21, 7, 13,
        0, 1, 7, 2, 3, 1, 2, 1, 3, 0, 1, 4,
        3, 5, 12, 6, 4, 3, 5, 5, 5, 5, 2, 4,
        3, 5, 3, 5, 3, 6, 1, 1, 3, 2, 6, 4,
        11, 9, 15, 22, 15, 16, 13, 10, 26, 26, 24, 13,
    ];

    /// <summary>Dobson (1983) (R datasets::PlantGrowth): dried plant weights, groups ctrl, trt1, trt2, 10 each.</summary>
    public static readonly double[] PlantGrowth =
    [
        4.17, 5.58, 5.18, 6.11, 4.5, 4.61, 5.17, 4.53, 5.33, 5.14,
        4.81, 4.17, 4.41, 3.59, 5.87, 3.83, 6.03, 4.89, 4.32, 4.69,
        6.31, 5.12, 5.54, 5.5, 5.37, 5.29, 4.92, 6.15, 5.8, 5.26,
    ];

    /// <summary>Residuals of the one-way model: each value minus the mean of its group, for consecutive groups of
    /// equal size (the layout of the samples above).</summary>
    public static double[] OneWayResiduals(double[] values, int groupSize)
    {
        var residuals = new double[values.Length];
        for (var start = 0; start < values.Length; start += groupSize)
        {
            var mean = values.AsSpan(start, groupSize).ToArray().Average();
            for (var i = start; i < start + groupSize; i++)
            {
                residuals[i] = values[i] - mean;
            }
        }

        return residuals;
    }

    /// <summary>A deterministic near-normal sample: the sum of three scrambled uniform grids,
    /// ((7919 i) mod 10007)/10007 + ((104729 i) mod 10009)/10009 + ((1299709 i) mod 10037)/10037, i = 1..n.
    /// Every term is an exactly rounded quotient of integers, so R and C# build the same doubles.</summary>
    public static double[] ScrambledSum(int n)
    {
        var x = new double[n];
        for (long i = 1; i <= n; i++)
        {
            x[i - 1] = ((i * 7919 % 10007) / 10007.0) + ((i * 104729 % 10009) / 10009.0) + ((i * 1299709 % 10037) / 10037.0);
        }

        return x;
    }
}
