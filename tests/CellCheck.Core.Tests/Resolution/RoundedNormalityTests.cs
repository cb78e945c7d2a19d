using CellCheck.Core.Analysis;
using CellCheck.Core.Data;
using CellCheck.Core.Resolution;
using CellCheck.Core.Statistics;
using MathNet.Numerics.Random;

namespace CellCheck.Core.Tests.Resolution;

public sealed class RoundedNormalityTests
{
    private static DesignData Rounded(int seed, double step)
    {
        // 4 cells of 10 normal values (SD 1) rounded to the step, as an instrument with that resolution would record them
        var random = new Xoshiro256StarStar(seed);
        var codes = new int[40];
        var values = new double[40];
        for (var i = 0; i < 40; i++)
        {
            codes[i] = i % 4;
            var z = Math.Sqrt(-2 * Math.Log(1 - random.NextDouble())) * Math.Cos(2 * Math.PI * random.NextDouble());
            values[i] = Math.Round(z / step) * step;
        }

        return new DesignData([new FactorColumn("a", ["p", "q", "r", "s"], codes)], [new ResponseColumn("y", null, 0, values) { Decimals = 1 }],
            Enumerable.Range(2, 40).ToArray(), [Array.Empty<ExcludedRow>()]);
    }

    [Fact]
    public void The_recording_step_is_the_common_increment_of_the_values()
    {
        var cells = GroupedValues.FromGroups([[0.5, 1.5, 2.0], [1.0, 3.5, 3.5]]);
        var summary = RecordingStep.Summarize(cells, decimals: 1, residualSd: 1.0);
        Assert.Equal(0.5, summary.Step!.Value, 1e-12);
        Assert.Equal(1.0 / 6, summary.TiedShare, 1e-12);
        Assert.True(summary.Coarse);
    }

    [Fact]
    public void Rounded_normal_data_are_rarely_flagged_by_the_resolution_aware_p_where_the_plain_test_often_is()
    {
        // Step 0.8 SD: a coarse instrument. Seeded; 60 data sets. Bound: alpha + 2 binomial SE at 60 sets
        // (0.05 + 2 * sqrt(0.05 * 0.95 / 60) = 0.106; common practice, no source).
        const int Sets = 60;
        var aware = 0;
        var plain = 0;
        for (var s = 0; s < Sets; s++)
        {
            var report = ResponseAnalyzer.Analyze(Rounded(100 + s, 0.8), 0, new AnalysisOptions());
            Assert.True(report.Resolution!.Coarse);
            aware += report.Verdict.Assumptions[0].Status == CheckStatus.Flag ? 1 : 0;
            plain += report.Pooled.Checks[0].Status == CheckStatus.Flag ? 1 : 0;
        }

        Assert.True(aware / (double)Sets <= 0.05 + (2 * Math.Sqrt(0.05 * 0.95 / Sets)), $"resolution-aware flag rate {aware}/{Sets}");
        Assert.True(plain > aware, $"plain Shapiro-Wilk flagged {plain}, resolution-aware {aware}");
    }
}
