using CellCheck.Core.Statistics;

namespace CellCheck.Core.Order;

/// <summary>
/// The runs test about the median (Wald &amp; Wolfowitz 1940, "On a test whether two samples are from the same
/// population", Ann. Math. Statist. 11, 147-162, for the moments of the run count): values are marked as below or
/// above the median of all values, values equal to the median are dropped (and counted in
/// <see cref="RunsTestResult.Dropped"/>), and too few runs (drift, clustering) or too many (alternation) in run
/// order speak against independence.
/// </summary>
/// <remarks>
/// The run count R has E[R] = 1 + 2 n1 n2 / n and Var[R] = 2 n1 n2 (2 n1 n2 − n) / (n²(n − 1)); the normal p is two
/// sided, without continuity correction. When n1 ≤ 20 and n2 ≤ 20 the p-value is taken instead from the exact
/// distribution of R (Swed &amp; Eisenhart 1943; see <see cref="RunsDistribution"/>) as twice the smaller tail, at most
/// 1; the normal p is kept beside it. Not testable (<see cref="NotTestableReason.TooFewValues"/>) when either side of
/// the median is empty or fewer than three values remain.
/// </remarks>
public static class RunsTest
{
    /// <summary>Largest n1 and n2 for which the exact p is used.</summary>
    public const int ExactLimit = 20;

    /// <summary>Tests values in run order for randomness of their sequence about the median.</summary>
    /// <exception cref="ArgumentException">A value is not finite.</exception>
    public static RunsTestResult Test(ReadOnlySpan<double> values)
    {
        SampleGuard.RequireFinite(values, nameof(values));
        if (values.IsEmpty)
        {
            return NotTestable(0, 0, 0, double.NaN);
        }

        var median = Descriptive.Median(values);
        var n1 = 0;
        var n2 = 0;
        var runs = 0;
        var previous = 0;
        foreach (var v in values)
        {
            var side = v < median ? -1 : v > median ? 1 : 0;
            if (side == 0)
            {
                continue;
            }

            n1 += side < 0 ? 1 : 0;
            n2 += side > 0 ? 1 : 0;
            runs += side != previous ? 1 : 0;
            previous = side;
        }

        var dropped = values.Length - n1 - n2;
        if (n1 == 0 || n2 == 0 || n1 + n2 < 3)
        {
            return NotTestable(n1, n2, dropped, median);
        }

        double n = n1 + n2;
        double product = 2.0 * n1 * n2;
        var expected = 1.0 + (product / n);
        var variance = product * (product - n) / (n * n * (n - 1.0));
        var z = (runs - expected) / Math.Sqrt(variance);
        var pNormal = Math.Min(1.0, 2.0 * StandardNormal.UpperTail(Math.Abs(z)));
        var exact = n1 <= ExactLimit && n2 <= ExactLimit;
        var p = exact ? RunsDistribution.TwoSidedP(n1, n2, runs) : pNormal;
        return new RunsTestResult(runs, n1, n2, dropped, median, expected, variance, z, p, pNormal,
            exact ? OrderMethods.Exact : OrderMethods.NormalApproximation);
    }

    private static RunsTestResult NotTestable(int n1, int n2, int dropped, double median) =>
        new(0, n1, n2, dropped, median, double.NaN, double.NaN, double.NaN, double.NaN, double.NaN, OrderMethods.None,
            NotTestableReason.TooFewValues);
}
