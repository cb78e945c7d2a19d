using CellCheck.Core.Statistics;

namespace CellCheck.Core.Calibration;

/// <summary>
/// Runs the verdict over a grid of designs under clean data and the two stated departures, and compares its power
/// with the best single candidate test at the same exact size. Used by the calibration command; seeded, so the
/// table is the same on every run.
/// </summary>
public static class CalibrationGrid
{
    /// <summary>The standard grid: 4 to 24 cells, 2 to 20 values per cell, balanced and unbalanced.</summary>
    public static IReadOnlyList<GridDesign> Standard()
    {
        var designs = new List<GridDesign>();
        foreach (var cells in new[] { 4, 8, 12, 24 })
        {
            foreach (var n in new[] { 2, 3, 4, 5, 10, 20 })
            {
                designs.Add(GridDesign.Create(cells, n, balanced: true));
                if (n > 2)
                {
                    designs.Add(GridDesign.Create(cells, n, balanced: false));
                }
            }
        }

        return designs;
    }

    public static GridRow Run(GridDesign design, double alpha, CalibrationSettings settings)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(settings);
        var calibration = Calibrator.Calibrate(design.Shape, alpha, settings);
        var operating = calibration.Operating!;
        var nulls = Candidates(design.Shape, Departure.None, settings.Seed + 10, settings.NullDraws);
        var nullDistributions = Enumerable.Range(0, CandidateTests.Names.Count).Select(t => new NullDistribution(nulls.Select(d => d[t]))).ToArray();
        RateEstimate[] Rates(Departure departure, int seed)
        {
            var draws = Candidates(design.Shape, departure, seed, settings.ScenarioDraws);
            return Enumerable.Range(0, CandidateTests.Names.Count)
                .Select(t => new RateEstimate(draws.Count(d => nullDistributions[t].PValue(d[t]) < alpha), draws.Length)).ToArray();
        }

        var variance = Rates(Departure.VarianceRatio4, settings.Seed + 12);
        var lognormal = Rates(Departure.Lognormal, settings.Seed + 13);
        var heavy = Rates(Departure.HeavyTails, settings.Seed + 14);
        var bestVariance = Array.IndexOf(variance, variance.MaxBy(r => r.Hits)!);
        var bestLognormal = Array.IndexOf(lognormal, lognormal.MaxBy(r => r.Hits)!);
        var heavyDraws = Calibrator.Simulate(new CellMeansPlan(design.Shape), calibration.Choice, Departure.HeavyTails, settings.Seed + 15, settings.ScenarioDraws);
        var heavySpread = heavyDraws.Count(d => FamilyDecision.Adjusted([calibration.NormalityNull!.PValue(d.Normality), calibration.SpreadNull!.PValue(d.Spread)])[1] < alpha);
        return new GridRow(design, calibration.Choice, operating.FalseAlarm, operating.VarianceRatio4, operating.Lognormal,
            CandidateTests.Names[bestVariance], variance[bestVariance], CandidateTests.Names[bestLognormal], lognormal[bestLognormal],
            new RateEstimate(heavySpread, heavyDraws.Length), variance, lognormal, heavy);
    }

    private static double[][] Candidates(DesignShape shape, Departure departure, int seed, int draws)
    {
        var starts = new CellMeansPlan(shape).CellStarts;
        var eligible = Enumerable.Range(0, shape.Sizes.Length).ToArray();

        var results = new double[draws][];
        Parallel.For(0, draws, i =>
        {
            var values = new double[shape.Count];
            DrawGenerator.Fill(starts, eligible, departure, seed, i, values);
            results[i] = CandidateTests.Evaluate(new GroupedValues(values, starts));
        });
        return results;
    }
}
