using CellCheck.Core.Statistics;

namespace CellCheck.Core.Planning;

/// <summary>
/// The upper critical value of the central F distribution: the f with P(F ≥ f) = α, found by bisection on log f
/// against the directly computed upper tail (<see cref="UpperTail.F"/>) until the bracket is one unit in the last
/// place. Slow beside a Newton step but exact to the precision of the tail function, which is what the power of a
/// test at that critical value needs.
/// </summary>
public static class FCritical
{
    public static double Upper(double alpha, double df1, double df2)
    {
        if (!(alpha > 0 && alpha < 1) || !(df1 > 0) || !(df2 > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(alpha), $"needs 0 < alpha < 1, df1 > 0, df2 > 0 (got {alpha}, {df1}, {df2})");
        }

        // bracket log f: the tail falls from 1 at f = 0 to 0 as f grows
        double lo = -1, hi = 1;
        while (UpperTail.F(Math.Exp(lo), df1, df2) < alpha)
        {
            lo *= 2;
        }

        while (UpperTail.F(Math.Exp(hi), df1, df2) > alpha)
        {
            hi *= 2;
        }

        for (var i = 0; i < 200; i++)
        {
            var mid = 0.5 * (lo + hi);
            if (mid <= lo || mid >= hi)
            {
                break;
            }

            if (UpperTail.F(Math.Exp(mid), df1, df2) > alpha)
            {
                lo = mid;
            }
            else
            {
                hi = mid;
            }
        }

        return Math.Exp(0.5 * (lo + hi));
    }
}
