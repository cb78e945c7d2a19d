using CellCheck.Core.Calibration;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Planning;

/// <summary>
/// For each single check, the replicates per cell at which it flags its departure (one lognormal cell for the
/// normality checks, a 4:1 variance ratio in one cell for the spread checks) at least at the target rate, simulated for
/// a balanced design of the planned number of cells under the cell-means model. Sizes are tried on a roughly geometric
/// grid until the rate is reached, then bisected between the last two sizes tried; every size uses the same seeded data
/// sets (common random numbers), so neighbouring sizes differ little by chance. Each rate carries its Monte Carlo
/// interval: an answer is an estimate within a replicate or two.
/// </summary>
public static class SensitivityPlanner
{
    /// <summary>Largest replicates per cell tried.</summary>
    public const int SearchLimit = 100;

    /// <summary>Reason code when the target rate is not reached up to <see cref="SearchLimit"/>.</summary>
    public const string BeyondLimit = "beyond-search-limit";

    private static readonly int[] Grid = [3, 4, 5, 6, 8, 10, 12, 16, 20, 25, 32, 40, 50, 64, 80, 100];

    public static IReadOnlyList<SensitivityNeed> Plan(int cells, double alpha, AdjustMethod adjust, double target, int draws, int seed)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(cells, 1);
        ArgumentOutOfRangeException.ThrowIfLessThan(draws, 1);
        var cache = new Dictionary<(int N, Departure Departure), RateEstimate?[]>();
        RateEstimate? RateAt(int n, int test)
        {
            var departure = SensitivityChecks.All[test].Departure;
            if (!cache.TryGetValue((n, departure), out var rates))
            {
                var plan = new CellMeansPlan(new DesignShape(Enumerable.Repeat(n, cells)));
                var normality = departure == Departure.Lognormal;
                rates = CheckSensitivity.Rates(plan, alpha, adjust, departure, draws, seed, normality, !normality).Rates;
                cache[(n, departure)] = rates;
            }

            return rates[test];
        }

        bool Reached(int n, int test) => RateAt(n, test) is { } r && r.Rate >= target;
        var needs = new List<SensitivityNeed>();
        for (var t = 0; t < SensitivityChecks.All.Count; t++)
        {
            var check = SensitivityChecks.All[t];
            var k = Array.FindIndex(Grid, n => Reached(n, t));
            if (k < 0)
            {
                needs.Add(new SensitivityNeed(check.Check, check.Scope, check.Departure, null, RateAt(SearchLimit, t), null, BeyondLimit));
                continue;
            }

            int lo = k == 0 ? Grid[0] - 1 : Grid[k - 1], hi = Grid[k];
            while (hi - lo > 1)
            {
                var mid = lo + ((hi - lo) / 2);
                if (Reached(mid, t))
                {
                    hi = mid;
                }
                else
                {
                    lo = mid;
                }
            }

            var below = hi - 1 >= 2 ? RateAt(hi - 1, t) : null;
            needs.Add(new SensitivityNeed(check.Check, check.Scope, check.Departure, hi, RateAt(hi, t), below, null));
        }

        return needs;
    }
}
