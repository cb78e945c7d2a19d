using CellCheck.Core.Statistics;

namespace CellCheck.Core.Calibration;

/// <summary>
/// Every single test the verdict could have used, as statistics oriented larger = more evidence, for the
/// calibration grid's comparison with the best single test.
/// </summary>
public static class CandidateTests
{
    /// <summary>Names of the candidate tests, in the order of <see cref="Evaluate"/>.</summary>
    public static IReadOnlyList<string> Names { get; } =
    [
        "shapiro-wilk (pooled)", "anderson-darling (pooled)", "dagostino-pearson (pooled)",
        "levene", "brown-forsythe", "brown-forsythe-zeros-removed", "bartlett", "fligner-killeen", "bartlett-kurtosis-adjusted",
    ];

    internal static double[] Evaluate(GroupedValues cells)
    {
        var residuals = new double[cells.Count];
        var ss = 0.0;
        for (var c = 0; c < cells.GroupCount; c++)
        {
            var y = cells.Group(c);
            var mean = Descriptive.Mean(y);
            for (var j = 0; j < y.Length; j++)
            {
                residuals[cells.Starts[c] + j] = y[j] - mean;
                ss += (y[j] - mean) * (y[j] - mean);
            }
        }

        var s = Math.Sqrt(ss / (cells.Count - cells.GroupCount));
        for (var c = 0; c < cells.GroupCount; c++)
        {
            for (var i = cells.Starts[c]; i < cells.Starts[c + 1]; i++)
            {
                residuals[i] /= s * Math.Sqrt(1.0 - (1.0 / cells.Size(c)));
            }
        }

        var sw = ShapiroWilk.Test(residuals);
        return
        [
            sw.IsTestable ? 1.0 - sw.Statistic : double.NaN,
            Stat(AndersonDarling.Test(residuals)),
            Stat(DagostinoPearson.Test(residuals)),
            Stat(Levene.Test(cells)),
            Stat(BrownForsythe.Test(cells)),
            Stat(BrownForsytheZerosRemoved.Test(cells)),
            Stat(Bartlett.Test(cells)),
            Stat(FlignerKilleen.Test(cells)),
            Stat(BartlettKurtosisAdjusted.Test(cells)),
        ];
    }

    private static double Stat(TestOutcome o) => o.IsTestable ? o.Statistic : double.NaN;
}
