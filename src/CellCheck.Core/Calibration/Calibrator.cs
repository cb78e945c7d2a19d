using System.Collections.Concurrent;

namespace CellCheck.Core.Calibration;

/// <summary>
/// Simulates, once per design shape, the null distributions of the primary statistics and the verdict's
/// operating characteristics. Results are cached per (shape, alpha, settings), so responses of one design share them.
/// Draws run in parallel; every draw is seeded by its index, so results do not depend on scheduling.
/// </summary>
public static class Calibrator
{
    private static readonly ConcurrentDictionary<(string Plan, double Alpha, CalibrationSettings Settings), Lazy<ShapeCalibration>> Cache = new();

    /// <summary>Calibration of the cell-means model for these replicated cell sizes.</summary>
    public static ShapeCalibration Calibrate(DesignShape shape, double alpha, CalibrationSettings settings) =>
        Calibrate(new CellMeansPlan(shape), alpha, settings);

    public static ShapeCalibration Calibrate(INullPlan plan, double alpha, CalibrationSettings settings)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(settings);
        return Cache.GetOrAdd((plan.Key, alpha, settings), _ => new Lazy<ShapeCalibration>(() => Build(plan, alpha, settings))).Value;
    }

    private static ShapeCalibration Build(INullPlan plan, double alpha, CalibrationSettings settings)
    {
        var shape = plan.Shape;
        var choice = PrimaryRules.Choose(shape, plan.UsableResiduals);
        if (plan.Rows > settings.MonteCarloLimit || plan.UsableResiduals == 0)
        {
            return new ShapeCalibration(shape, choice, null, null, null);
        }

        var nulls = Simulate(plan, choice, Departure.None, settings.Seed, settings.NullDrawsFor(plan.Rows));
        var normalityNull = new NullDistribution(nulls.Select(s => s.Normality));
        var spreadNull = new NullDistribution(nulls.Select(s => s.Spread));
        RateEstimate Rate(Departure departure, int seed)
        {
            var draws = Simulate(plan, choice, departure, seed, settings.ScenarioDraws);
            var hits = draws.Count(d => FamilyDecision.AnyFlag([normalityNull.PValue(d.Normality), spreadNull.PValue(d.Spread)], alpha));
            return new RateEstimate(hits, draws.Length);
        }

        var operating = new OperatingCharacteristics(alpha,
            Rate(Departure.None, settings.Seed + 1), Rate(Departure.VarianceRatio4, settings.Seed + 2), Rate(Departure.Lognormal, settings.Seed + 3));
        return new ShapeCalibration(shape, choice, normalityNull, spreadNull, operating);
    }

    /// <summary>Primary statistics of <paramref name="draws"/> simulated data sets for this plan.</summary>
    internal static (double Normality, double Spread)[] Simulate(INullPlan plan, PrimaryChoice choice, Departure departure, int seed, int draws)
    {
        var results = new (double, double)[draws];
        Parallel.For(0, draws,
            () => new SimulationWorkspace(plan, choice),
            (i, _, local) =>
            {
                DrawGenerator.Fill(plan.CellStarts, local.Evaluator.ReplicatedCells, departure, seed, i, local.Values);
                plan.Residualize(local.Values, local.Residuals, local.Studentized);
                results[i] = local.Evaluator.Stats(local.Residuals, local.Studentized);
                return local;
            },
            _ => { });
        return results;
    }
}
