using CellCheck.Core.Models;

namespace CellCheck.Core.Planning;

/// <summary>
/// The smallest number of replicates per cell at which a term's F test reaches a target power. Power rises with n
/// (λ grows in proportion and the residual degrees of freedom grow), so the answer is found by doubling from the
/// smallest n with a residual degree of freedom and then bisecting over whole numbers; the real-valued root of
/// power(n) = target is refined by bisection between the last failing and the first passing n.
/// </summary>
public static class ReplicatesNeeded
{
    /// <summary>The search stops here and reports the target as out of reach.</summary>
    public const int SearchLimit = 1_000_000;

    /// <summary>Reason code when the target is not reached within <see cref="SearchLimit"/> replicates.</summary>
    public const string BeyondLimit = "beyond-search-limit";

    /// <summary>Reason code when the term has no degrees of freedom (a factor with a single level).</summary>
    public const string NoTermDf = "no-term-df";

    public static TermPlan Plan(PlannedDesign design, ModelTerm term, SmallestEffect effect, double sd, double alpha, double target, int? currentReplicates)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(term);
        if (!(target > 0 && target < 1))
        {
            throw new ArgumentOutOfRangeException(nameof(target), target, "target power must lie in (0, 1)");
        }

        var name = design.TermName(term);
        var df1 = design.TermDf(term);
        var minimum = design.MinimumReplicates;
        if (minimum > SearchLimit)
        {
            return new TermPlan(name, df1, null, null, null, null, null, BeyondLimit);
        }

        TermPower? current = currentReplicates is { } c && c >= minimum ? FactorialPower.Power(design, term, c, effect, sd, alpha) : null;
        if (df1 < 1)
        {
            return new TermPlan(name, df1, current, null, null, null, null, NoTermDf);
        }

        double PowerAt(double n) => FactorialPower.Power(design, term, n, effect, sd, alpha).Power;
        var hi = minimum;
        var lo = minimum - 1; // fails by convention: no residual df
        while (!(PowerAt(hi) >= target))
        {
            if (hi >= SearchLimit)
            {
                return new TermPlan(name, df1, current, null, null, null, null, BeyondLimit);
            }

            lo = hi;
            hi = (int)Math.Min((long)hi * 2, SearchLimit);
        }

        while (hi - lo > 1)
        {
            var mid = lo + ((hi - lo) / 2);
            if (PowerAt(mid) >= target)
            {
                hi = mid;
            }
            else
            {
                lo = mid;
            }
        }

        var exact = ExactRoot(design, lo, hi, target, PowerAt);
        var below = hi - 1 >= minimum ? FactorialPower.Power(design, term, hi - 1, effect, sd, alpha) : null;
        return new TermPlan(name, df1, current, hi, exact, FactorialPower.Power(design, term, hi, effect, sd, alpha), below, null);
    }

    /// <summary>The real n in (lo, hi] with power(n) = target; power at lo (or where the residual df reach zero) is below it.</summary>
    private static double ExactRoot(PlannedDesign design, double lo, double hi, double target, Func<double, double> powerAt)
    {
        double a = Math.Max(lo, design.ZeroResidualDfReplicates), b = hi;
        for (var i = 0; i < 200 && b - a > 1e-13 * b; i++)
        {
            var mid = 0.5 * (a + b);
            if (powerAt(mid) >= target)
            {
                b = mid;
            }
            else
            {
                a = mid;
            }
        }

        return 0.5 * (a + b);
    }
}
