namespace CellCheck.Core.Remedies;

/// <summary>
/// Spread-versus-level estimate of a variance-stabilising power: if the SD of a cell grows as a power of its mean,
/// s ∝ m^b, then y^(1−b) (log y at b = 1) has roughly constant spread (Bartlett 1947, "The use of transformations",
/// Biometrics 3, 39-52, by the delta method: SD(y^p) ≈ |p|·m^(p−1)·SD(y)). b is the least-squares slope of log s on
/// log m over the cells with at least two values, a positive mean and a positive SD; it needs at least three
/// such cells and some spread in their means.
/// </summary>
public static class SpreadLevel
{
    /// <summary>Fewest cells the slope is computed from.</summary>
    public const int MinimumCells = 3;

    /// <summary>Fits the slope over the cells given by their sizes, levels (means) and spreads (SDs).</summary>
    /// <exception cref="ArgumentException">The three lists differ in length.</exception>
    public static SpreadLevelResult Fit(IReadOnlyList<int> sizes, IReadOnlyList<double> levels, IReadOnlyList<double> spreads)
    {
        ArgumentNullException.ThrowIfNull(sizes);
        ArgumentNullException.ThrowIfNull(levels);
        ArgumentNullException.ThrowIfNull(spreads);
        if (sizes.Count != levels.Count || levels.Count != spreads.Count)
        {
            throw new ArgumentException("sizes, levels and spreads must have one entry per cell", nameof(levels));
        }

        var x = new List<double>();
        var y = new List<double>();
        for (var c = 0; c < sizes.Count; c++)
        {
            if (sizes[c] < 2 || !double.IsFinite(levels[c]) || !double.IsFinite(spreads[c]))
            {
                continue;
            }

            if (levels[c] <= 0)
            {
                return new SpreadLevelResult(null, null, 0, RemedyReason.NonPositiveValues);
            }

            if (spreads[c] > 0)
            {
                x.Add(Math.Log(levels[c]));
                y.Add(Math.Log(spreads[c]));
            }
        }

        if (x.Count < MinimumCells)
        {
            return new SpreadLevelResult(null, null, x.Count, RemedyReason.TooFewCells);
        }

        var mx = x.Average();
        var my = y.Average();
        double sxx = 0, sxy = 0;
        for (var i = 0; i < x.Count; i++)
        {
            sxx += (x[i] - mx) * (x[i] - mx);
            sxy += (x[i] - mx) * (y[i] - my);
        }

        // means equal to within rounding: no level to regress on
        if (sxx <= 1e-24 * x.Count * Math.Max(1, mx * mx))
        {
            return new SpreadLevelResult(null, null, x.Count, RemedyReason.NoLevelSpread);
        }

        var slope = sxy / sxx;
        return new SpreadLevelResult(slope, my - (slope * mx), x.Count, null);
    }
}
