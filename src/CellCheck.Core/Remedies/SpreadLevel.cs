using MathNet.Numerics.Distributions;

namespace CellCheck.Core.Remedies;

/// <summary>
/// Spread-versus-level estimate of a variance-stabilising power: if the SD of a cell grows as a power of its mean,
/// s ∝ m^b, then y^(1−b) (log y at b = 1) has roughly constant spread (Bartlett 1947, "The use of transformations",
/// Biometrics 3, 39-52, by the delta method: SD(y^p) ≈ |p|·m^(p−1)·SD(y)). b is the least-squares slope of log s on
/// log m over the cells with at least two values, a positive mean and a positive SD; it needs at least three
/// such cells and some spread in their means. The interval of the power is the usual t interval of a least-squares
/// slope (cells − 2 df), which treats the log SDs as independent with equal error (roughly true for equal cell sizes).
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
        var intercept = my - (slope * mx);
        var sse = 0.0;
        for (var i = 0; i < x.Count; i++)
        {
            var e = y[i] - intercept - (slope * x[i]);
            sse += e * e;
        }

        var df = x.Count - 2;
        var se = Math.Sqrt(sse / df / sxx);
        var t = StudentT.InvCDF(0, 1, df, 0.975);
        return new SpreadLevelResult(slope, intercept, x.Count, null)
        {
            SlopeStandardError = se,
            PowerLower = 1 - slope - (t * se),
            PowerUpper = 1 - slope + (t * se),
        };
    }
}
