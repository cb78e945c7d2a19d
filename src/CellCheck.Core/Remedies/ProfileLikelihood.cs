using MathNet.Numerics.Distributions;

namespace CellCheck.Core.Remedies;

/// <summary>
/// Maximises a profile log-likelihood ℓ(λ) over a bounded range and finds its likelihood-ratio interval
/// (Box &amp; Cox 1964, §4: the approximate 100(1 − α)% region {λ : 2(ℓ(λ̂) − ℓ(λ)) ≤ χ²₁(1 − α)}).
/// </summary>
/// <remarks>
/// ℓ is first evaluated on a grid of step <see cref="GridStep"/> over the range, so that the global maximum on the
/// grid is found even when ℓ has more than one local maximum; Brent's method (<see cref="BoundedBrent"/>) then
/// refines it between the grid neighbours. λ̂ is determined to about √ε relative: ℓ is flat at its maximum, so no
/// optimiser can place it more closely in double precision. The interval ends are the first crossings of the cut
/// going outward from λ̂ (scanned on the grid, then located by Brent's root finder to 1e-12): when the
/// region above the cut is not connected, the part holding λ̂ is reported. Each distinct λ is evaluated once
/// (<see cref="RememberedProfile"/>): the root searches start from grid points and λ̂, whose values are known.
/// A profile that may be evaluated side by side has its grid points taken two at a time and its two interval ends
/// searched at once: each value is the one the profile gives alone, so λ̂ and the interval are the same doubles.
/// </remarks>
internal static class ProfileLikelihood
{
    /// <summary>Grid step for the first scan.</summary>
    public const double GridStep = 0.05;

    /// <summary>Grid step for the first scan of a costly profile (a design with tens of thousands of settings).</summary>
    public const double CoarseStep = 0.25;

    /// <summary>χ²₁(0.95)/2, the drop in log-likelihood that bounds the 95% interval.</summary>
    public static readonly double Cut = ChiSquared.InvCDF(1, PowerFit.Level) / 2;

    /// <param name="gridStep">The first scan's step: <see cref="GridStep"/>, or <see cref="CoarseStep"/> where one evaluation
    /// is costly (the scan then finds the global maximum only among maxima at least that far apart).</param>
    /// <param name="sideBySide">True when <paramref name="logLikelihood"/> may be called from two threads at once.</param>
    public static (double Lambda, double Max, double? Lower, double? Upper) Maximise(Func<double, double> logLikelihood, double lower, double upper,
        double gridStep = GridStep, bool sideBySide = false)
    {
        logLikelihood = new RememberedProfile(logLikelihood).At;
        var steps = (int)Math.Round((upper - lower) / gridStep);
        var grid = new double[steps + 1];
        var values = new double[steps + 1];
        var best = 0;
        for (var k = 0; k <= steps; k++)
        {
            grid[k] = k == steps ? upper : lower + (k * gridStep);
        }

        if (sideBySide)
        {
            Parallel.For(0, steps + 1, new ParallelOptions { MaxDegreeOfParallelism = 2 }, k => values[k] = logLikelihood(grid[k]));
        }
        else
        {
            for (var k = 0; k <= steps; k++)
            {
                values[k] = logLikelihood(grid[k]);
            }
        }

        for (var k = 0; k <= steps; k++)
        {
            if (values[k] > values[best] || double.IsNaN(values[best]))
            {
                best = k;
            }
        }

        double lambda = grid[best], max = values[best];
        if (best > 0 && best < steps)
        {
            var refined = BoundedBrent.Minimize(l => -logLikelihood(l), grid[best - 1], grid[best + 1], Tolerance(gridStep));
            var value = logLikelihood(refined);
            if (value >= max)
            {
                (lambda, max) = (refined, value);
            }
        }

        var level = max - Cut;
        double? Below() => End(logLikelihood, grid, values, lambda, level, -1, Tolerance(gridStep));
        double? Above() => End(logLikelihood, grid, values, lambda, level, +1, Tolerance(gridStep));
        if (!sideBySide)
        {
            return (lambda, max, Below(), Above());
        }

        var above = Task.Run(Above);
        var below = Below();
        return (lambda, max, below, above.Result);
    }

    /// <summary>Tolerance on λ of the refinements: 1e-12 on the fine scan; 1e-8 on the coarse scan of a costly profile,
    /// which is still below what ℓ's flatness at its maximum lets double precision resolve (about √ε relative).</summary>
    private static double Tolerance(double gridStep) => gridStep > GridStep ? 1e-8 : 1e-12;

    /// <summary>The first crossing of <paramref name="level"/> from λ̂ in direction <paramref name="direction"/>,
    /// or null when ℓ stays above it to the end of the grid.</summary>
    private static double? End(Func<double, double> logLikelihood, double[] grid, double[] values, double lambda, double level, int direction, double tolerance)
    {
        var inside = lambda;
        var points = Enumerable.Range(0, grid.Length).Where(k => direction < 0 ? grid[k] < lambda : grid[k] > lambda);
        foreach (var k in direction < 0 ? points.Reverse() : points)
        {
            var g = grid[k];
            if (values[k] < level)
            {
                var (a, b) = direction < 0 ? (g, inside) : (inside, g);
                return MathNet.Numerics.RootFinding.Brent.FindRoot(l => logLikelihood(l) - level, a, b, tolerance, 200);
            }

            inside = g;
        }

        return null;
    }
}
