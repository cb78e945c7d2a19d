using System.Collections.Concurrent;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Calibration;

/// <summary>
/// Simulates, once per design shape, the null distributions of the primary statistics and the verdict's
/// operating characteristics. Results are cached per (shape, alpha, settings), so responses of one design share them.
/// Draws run in parallel; every draw is seeded by its index, so results do not depend on scheduling.
/// </summary>
public static class Calibrator
{
    private static readonly ConcurrentDictionary<(string Shape, double Alpha, CalibrationSettings Settings), Lazy<ShapeCalibration>> Cache = new();

    public static ShapeCalibration Calibrate(DesignShape shape, double alpha, CalibrationSettings settings)
    {
        ArgumentNullException.ThrowIfNull(shape);
        ArgumentNullException.ThrowIfNull(settings);
        return Cache.GetOrAdd((shape.Key, alpha, settings), _ => new Lazy<ShapeCalibration>(() => Build(shape, alpha, settings))).Value;
    }

    private static ShapeCalibration Build(DesignShape shape, double alpha, CalibrationSettings settings)
    {
        var choice = PrimaryRules.Choose(shape);
        if (shape.Count > settings.MonteCarloLimit || shape.Sizes.Length == 0)
        {
            return new ShapeCalibration(shape, choice, null, null, null);
        }

        var nulls = Simulate(shape, choice, Departure.None, settings.Seed, settings.NullDrawsFor(shape.Count));
        var normalityNull = new NullDistribution(nulls.Select(s => s.Normality));
        var spreadNull = new NullDistribution(nulls.Select(s => s.Spread));
        RateEstimate Rate(Departure departure, int seed)
        {
            var draws = Simulate(shape, choice, departure, seed, settings.ScenarioDraws);
            var hits = draws.Count(d => FamilyDecision.AnyFlag([normalityNull.PValue(d.Normality), spreadNull.PValue(d.Spread)], alpha));
            return new RateEstimate(hits, draws.Length);
        }

        var operating = new OperatingCharacteristics(alpha,
            Rate(Departure.None, settings.Seed + 1), Rate(Departure.VarianceRatio4, settings.Seed + 2), Rate(Departure.Lognormal, settings.Seed + 3));
        return new ShapeCalibration(shape, choice, normalityNull, spreadNull, operating);
    }

    /// <summary>Primary statistics of <paramref name="draws"/> simulated data sets of this shape.</summary>
    internal static (double Normality, double Spread)[] Simulate(DesignShape shape, PrimaryChoice choice, Departure departure, int seed, int draws)
    {
        var results = new (double, double)[draws];
        var starts = new int[shape.Sizes.Length + 1];
        for (var c = 0; c < shape.Sizes.Length; c++)
        {
            starts[c + 1] = starts[c] + shape.Sizes[c];
        }

        Parallel.For(0, draws,
            () => (Values: new double[shape.Count], Evaluator: new PrimaryEvaluator(choice, shape.Count, shape.Sizes.Length, shape.Sizes[^1])),
            (i, _, local) =>
            {
                DrawGenerator.Fill(shape, departure, seed, i, local.Values);
                results[i] = local.Evaluator.Evaluate(new GroupedValues(local.Values, starts));
                return local;
            },
            _ => { });
        return results;
    }
}
