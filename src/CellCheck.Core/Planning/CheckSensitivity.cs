using System.Collections.Concurrent;
using CellCheck.Core.Calibration;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Planning;

/// <summary>
/// Simulates, for a design's null plan (its cells and how its model turns responses into residuals), how often each
/// single check flags clean data, one lognormal cell (normality tests) and one cell with four times the variance
/// (spread tests), at alpha with the within-cell p-values adjusted across cells. The data sets come from the seeded
/// generator the verdict's calibration uses (<see cref="DrawGenerator"/>; the departing cell rotates over the replicated
/// cells), so the table is the same on every run. Tables are cached per (plan, alpha, adjustment, draws, seed).
/// </summary>
public static class CheckSensitivity
{
    private static readonly ConcurrentDictionary<(string Plan, double Alpha, AdjustMethod Adjust, int Draws, int Seed), Lazy<SensitivityTable>> Cache = new();

    public static SensitivityTable Simulate(INullPlan plan, double alpha, AdjustMethod adjust, int draws, int seed)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentOutOfRangeException.ThrowIfLessThan(draws, 1);
        return Cache.GetOrAdd((plan.Key, alpha, adjust, draws, seed), _ => new Lazy<SensitivityTable>(() => Build(plan, alpha, adjust, draws, seed))).Value;
    }

    private static SensitivityTable Build(INullPlan plan, double alpha, AdjustMethod adjust, int draws, int seed)
    {
        var clean = Rates(plan, alpha, adjust, Departure.None, draws, seed, normality: true, spread: true);
        var skewed = Rates(plan, alpha, adjust, Departure.Lognormal, draws, seed + 1, normality: true, spread: false);
        var uneven = Rates(plan, alpha, adjust, Departure.VarianceRatio4, draws, seed + 2, normality: false, spread: true);
        var rows = new List<SensitivityRow>();
        for (var t = 0; t < SensitivityChecks.All.Count; t++)
        {
            var check = SensitivityChecks.All[t];
            var catches = check.Departure == Departure.Lognormal ? skewed.Rates[t] : uneven.Rates[t];
            rows.Add(new SensitivityRow(check.Check, check.Scope, check.Departure, catches, clean.Rates[t], catches is null ? clean.Reasons[t] : null));
        }

        return new SensitivityTable(alpha, adjust, draws, seed, rows, null);
    }

    /// <summary>Flag rate of every test over <paramref name="draws"/> simulated data sets (null for a test that never ran,
    /// with the reason it gave on the first data set).</summary>
    internal static (RateEstimate?[] Rates, string?[] Reasons) Rates(INullPlan plan, double alpha, AdjustMethod adjust, Departure departure,
        int draws, int seed, bool normality, bool spread)
    {
        var count = SensitivityChecks.All.Count;
        var outcomes = new sbyte[draws][];
        var replicated = Enumerable.Range(0, plan.CellStarts.Length - 1).Where(c => plan.CellStarts[c + 1] - plan.CellStarts[c] >= 2).ToArray();
        string?[] reasons = [];
        Parallel.For(0, draws,
            () => new SensitivityWorkspace(plan, alpha, adjust),
            (i, _, local) =>
            {
                DrawGenerator.Fill(plan.CellStarts, replicated, departure, seed, i, local.Values);
                plan.Residualize(local.Values, local.Residuals, local.Studentized);
                var outcome = Enumerable.Repeat(SensitivityEvaluator.NotTestable, count).ToArray();
                local.Evaluator.Evaluate(local.Residuals, local.Studentized, normality, spread, outcome);
                outcomes[i] = outcome;
                if (i == 0)
                {
                    reasons = (string?[])local.Evaluator.Reasons.Clone();
                }

                return local;
            },
            _ => { });

        var rates = new RateEstimate?[count];
        for (var t = 0; t < count; t++)
        {
            int hits = 0, ran = 0;
            foreach (var o in outcomes)
            {
                ran += o[t] == SensitivityEvaluator.NotTestable ? 0 : 1;
                hits += o[t] == SensitivityEvaluator.Flag ? 1 : 0;
            }

            rates[t] = ran == 0 ? null : new RateEstimate(hits, ran);
        }

        return (rates, reasons);
    }
}
