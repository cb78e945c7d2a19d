using CellCheck.Core.Models;
using CellCheck.Core.Remedies;

namespace CellCheck.Core.Tests.Remedies;

/// <summary>
/// The Box-Cox profile from per-group power sums written plainly, one group and one term at a time (the form the
/// vectorised <see cref="GroupedPowerSums"/> replaced): the reference its results must equal bit for bit, since the
/// reports print λ̂, its interval and ℓ(λ̂) to the last digit.
/// </summary>
internal sealed class PlainGroupedProfile
{
    /// <summary>Series terms summed per cell.</summary>
    public const int Terms = 30;

    /// <summary>1/k for k ≤ Terms + 1 (a multiplication in the series loop instead of a division).</summary>
    private static readonly double[] Reciprocal = [.. Enumerable.Range(0, Terms + 2).Select(k => k == 0 ? 0 : 1.0 / k)];

    private readonly int[] starts;
    private readonly double[] logs;
    private readonly double[] centre;
    private readonly double[] reach;
    private readonly double[] sums;
    private readonly int[] terms;
    private readonly double sumLog;
    private readonly CellBlockFit? between;

    // scratch for one evaluation, reused (the optimiser evaluates one λ at a time)
    private readonly double[] within;
    private readonly double[]? means;
    private readonly double[]? betweenResiduals;

    /// <param name="starts">Group g holds rows starts[g] .. starts[g + 1] − 1 of <paramref name="logs"/>.</param>
    /// <param name="logs">log y of every row, grouped.</param>
    /// <param name="between">For groups that are not the model's cells (identical settings of cells and blocks), the
    /// weighted fit of the model to the group means; null when the groups are the cells of the cell-means model.</param>
    public PlainGroupedProfile(int[] starts, double[] logs, CellBlockFit? between = null)
    {
        this.starts = starts;
        this.between = between;
        this.logs = logs;
        var groups = starts.Length - 1;
        centre = new double[groups];
        reach = new double[groups];
        sums = new double[groups * (Terms + 1)];
        terms = new int[groups];
        within = new double[groups];
        means = between is null ? null : new double[groups];
        betweenResiduals = between is null ? null : new double[groups];
        var total = default(Core.Statistics.NeumaierSum);
        for (var g = 0; g < groups; g++)
        {
            // Σ log y: each group's logs in order, then the groups' sums in group order, compensated
            var groupSum = 0.0;
            foreach (var l in logs.AsSpan(starts[g], starts[g + 1] - starts[g]))
            {
                groupSum += l;
            }

            total.Add(groupSum);
        }

        sumLog = total.Value;
        for (var g = 0; g < groups; g++)
        {
            var cell = logs.AsSpan(starts[g], starts[g + 1] - starts[g]);
            if (cell.Length == 0)
            {
                continue;
            }

            centre[g] = Core.Statistics.Descriptive.Mean(cell);
            foreach (var l in cell)
            {
                reach[g] = Math.Max(reach[g], Math.Abs(l - centre[g]));
            }

            var kept = terms[g] = TermsWithin(cell.Length, reach[g]);
            var s = sums.AsSpan(g * (Terms + 1), Terms + 1);
            foreach (var l in cell)
            {
                var e = l - centre[g];
                var power = e;
                for (var k = 1; k <= kept; k++)
                {
                    s[k] += power;
                    power *= e;
                }
            }

            // stored as S_k / k!
            var factorial = 1.0;
            for (var k = 1; k <= Terms; k++)
            {
                factorial *= k;
                s[k] /= factorial;
            }
        }
    }

    /// <summary>ℓ(λ) as defined by <see cref="BoxCox"/>.</summary>
    public double LogLikelihood(double lambda)
    {
        var groups = centre.Length;
        var top = double.NegativeInfinity;
        for (var g = 0; g < groups; g++)
        {
            if (starts[g + 1] - starts[g] > (between is null ? 1 : 0))
            {
                top = Math.Max(top, 2 * lambda * centre[g]);
            }
        }

        // with λ·log y_r = top/2: y^(λ) = e^{top/2}·w + constant, and in group g w = A_g·u + B_g
        var reference = lambda == 0 ? centre[0] : 0;
        Array.Clear(within);
        if (means is not null)
        {
            Array.Clear(means);
        }
        // groups are independent: evaluated in parallel, each into its own slot, then summed in order (deterministic)
        {
            for (var g = 0; g < groups; g++)
            {
                var n = starts[g + 1] - starts[g];
                if (n == 0)
                {
                    continue;
                }

                var half = (lambda * centre[g]) - (top / 2);
                var a = Math.Exp(half);
                var (sum, squares) = Sums(g, n, lambda);
                within[g] = n > 1 ? a * a * squares : 0;
                if (means is not null)
                {
                    var b = lambda == 0 ? centre[g] - reference : PreciseMath.ExpM1(half) / lambda;
                    means[g] = (a * sum / n) + b;
                }
            }
        }

        var total = 0.0;
        foreach (var part in within)
        {
            total += part;
        }

        if (means is not null)
        {
            var residuals = betweenResiduals!;
            between!.Residualize(means, residuals);
            for (var g = 0; g < groups; g++)
            {
                total += (starts[g + 1] - starts[g]) * residuals[g] * residuals[g];
            }
        }

        var count = logs.Length;
        return ((lambda - 1) * sumLog) - (count / 2.0 * (top + Math.Log(total) - Math.Log(count)));
    }

    /// <summary>Σu and Σu² − (Σu)²/n for group g, with u = expm1(λe)/λ (e at λ = 0).</summary>
    private (double Sum, double Squares) Sums(int g, int n, double lambda)
    {
        if (Math.Abs(lambda) * reach[g] > 1)
        {
            return Direct(g, n, lambda);
        }

        var s = sums.AsSpan(g * (Terms + 1), Terms + 1);
        double sum = 0, squares = 0, twoPower = 1;
        double previous = 0, power = 1; // power = λ^(k−1), previous = λ^(k−2)
        // bound on the k-th squared-series term relative to the sum of squares (which is at least reach²):
        // 4n·x^(k−2)/k! with x = 2|λ|·reach ≤ 2; stop once it is far below rounding
        var x = 2 * Math.Abs(lambda) * reach[g];
        var bound = 2.0 * n;
        for (var k = 1; k <= terms[g]; k++)
        {
            twoPower *= 2;
            var term = s[k];
            sum += power * term;
            if (k >= 2)
            {
                squares += (twoPower - 2) * previous * term;
                if (bound < 1e-18)
                {
                    break;
                }

                bound *= x * Reciprocal[k + 1];
            }

            previous = power;
            power *= lambda;
        }

        if (bound >= 1e-18 && terms[g] < Terms)
        {
            return Direct(g, n, lambda); // |λ| beyond the search range: more terms than were summed would be needed
        }

        return (sum, squares - (sum * sum / n));
    }

    /// <summary>The number of series terms that <see cref="Sums"/> uses at most for a group of n values whose centred logs
    /// reach <paramref name="reach"/>, over the whole search range of λ (the same stopping rule at the largest |λ|, on the
    /// series route): power sums above it are never read, so they are not formed.</summary>
    private static int TermsWithin(int n, double reach)
    {
        var x = 2 * Math.Min(1.0, Math.Max(-BoxCox.SearchLower, BoxCox.SearchUpper) * reach);
        var bound = 2.0 * n;
        for (var k = 2; k <= Terms; k++)
        {
            if (bound < 1e-18)
            {
                return k;
            }

            bound *= x * Reciprocal[k + 1];
        }

        return Terms;
    }

    private (double Sum, double Squares) Direct(int g, int n, double lambda)
    {
        var cell = logs.AsSpan(starts[g], n);
        double sum = 0, squares = 0;
        foreach (var l in cell)
        {
            sum += PreciseMath.ExpM1(lambda * (l - centre[g])) / lambda;
        }

        var mean = sum / n;
        foreach (var l in cell)
        {
            var d = (PreciseMath.ExpM1(lambda * (l - centre[g])) / lambda) - mean;
            squares += d * d;
        }

        return (sum, squares);
    }
}
