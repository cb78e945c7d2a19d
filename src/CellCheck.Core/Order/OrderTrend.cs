using CellCheck.Core.Data;
using CellCheck.Core.Statistics;
using MathNet.Numerics.Distributions;

namespace CellCheck.Core.Order;

/// <summary>
/// Drift over run order: the least-squares slope of the residuals on run position 1..n (or on given run-order
/// values such as times), with t = slope / SE on n − 2 degrees of freedom and a two-sided Student t p-value
/// (simple linear regression, e.g. Draper &amp; Smith 1998, Applied Regression Analysis, 3rd ed., ch. 1).
/// </summary>
/// <remarks>
/// The residuals of a model fitted with its own parameters have fewer than n degrees of freedom, so the t reference
/// is approximate unless the design is orthogonal to run order; it is meant as a screen for drift. Sums are taken
/// about the means (two-pass) with Neumaier's (1974) compensation: with plain sums the slope at n = 10⁶ was off by 8e-12
/// of itself, and a p of 3e-168 (t ≈ 28) by 3e-9 (tests/CellCheck.Core.Tests/Scale). Not testable with fewer than three values
/// (<see cref="NotTestableReason.TooFewValues"/>) or when the residuals or the run-order values are all equal
/// (<see cref="NotTestableReason.ZeroSpread"/>). Residuals lying exactly on a line give t = ±∞ and p = 0.
/// The p-value is 2 F_t(−|t|) from MathNet's Student t CDF, a lower tail, so small p keep their precision.
/// </remarks>
public static class OrderTrend
{
    /// <summary>Regresses the residuals on run position 1..n.</summary>
    public static OrderTrendResult Test(ReadOnlySpan<double> residuals) => Fit(residuals, new CountedPositions(1));

    /// <summary>Regresses the residuals on the given run-order values (same length, same order).</summary>
    /// <exception cref="ArgumentException">The lengths differ or a value is not finite.</exception>
    public static OrderTrendResult Test(ReadOnlySpan<double> residuals, ReadOnlySpan<double> runOrder)
    {
        if (runOrder.Length != residuals.Length)
        {
            throw new ArgumentException($"There are {residuals.Length} residuals but {runOrder.Length} run-order values.", nameof(runOrder));
        }

        SampleGuard.RequireFinite(runOrder, nameof(runOrder));
        return Fit(residuals, new HeldPositions(runOrder));
    }

    /// <summary>Regresses the residuals on the given run positions (same length, same order); consecutive positions
    /// are counted on from their start and whole ones read from their offsets, the same doubles as if they were held.</summary>
    /// <exception cref="ArgumentException">The lengths differ or a value is not finite.</exception>
    public static OrderTrendResult Test(ReadOnlySpan<double> residuals, RunPositions runOrder)
    {
        ArgumentNullException.ThrowIfNull(runOrder);
        if (runOrder.Length == 0 || (!runOrder.IsConsecutive && !runOrder.IsWhole) || (runOrder.IsWhole && runOrder.Offsets.Contains(int.MinValue)))
        {
            // held as doubles, or with a missing position (refused as the held form refuses it)
            return runOrder.IsWhole ? Test(residuals, runOrder.ToArray()) : Test(residuals, runOrder.Held);
        }

        if (runOrder.Length != residuals.Length)
        {
            throw new ArgumentException($"There are {residuals.Length} residuals but {runOrder.Length} run-order values.", nameof(runOrder));
        }

        return runOrder.IsWhole ? Fit(residuals, new OffsetPositions(runOrder.Offsets, runOrder.First)) : Fit(residuals, new CountedPositions(runOrder.First));
    }

    private static OrderTrendResult Fit<TPositions>(ReadOnlySpan<double> residuals, TPositions runOrder)
        where TPositions : IPositionReader, allows ref struct
    {
        SampleGuard.RequireFinite(residuals, nameof(residuals));
        var n = residuals.Length;
        if (n < 3)
        {
            return NotTestable(NotTestableReason.TooFewValues);
        }

        var tMean = Mean(runOrder, n);
        var eMean = Descriptive.Mean(residuals);
        var sxxSum = default(NeumaierSum);
        var sxySum = default(NeumaierSum);
        for (var i = 0; i < n; i++)
        {
            var dt = runOrder[i] - tMean;
            sxxSum.Add(dt * dt);
            sxySum.Add(dt * (residuals[i] - eMean));
        }

        var sxx = sxxSum.Value;
        var sxy = sxySum.Value;

        if (sxx == 0.0 || SampleGuard.HasNoSpread(residuals))
        {
            return NotTestable(NotTestableReason.ZeroSpread);
        }

        var slope = sxy / sxx;
        var sseSum = default(NeumaierSum);
        for (var i = 0; i < n; i++)
        {
            var r = residuals[i] - eMean - (slope * (runOrder[i] - tMean));
            sseSum.Add(r * r);
        }

        var sse = sseSum.Value;

        double df = n - 2;
        var se = Math.Sqrt(sse / df / sxx);
        var t = slope / se;
        var p = se == 0.0 ? 0.0 : Math.Min(1.0, 2.0 * StudentT.CDF(0.0, 1.0, df, -Math.Abs(t)));
        return new OrderTrendResult(slope, se, t, df, p);
    }

    /// <summary>The mean of the positions by <see cref="Descriptive.Mean"/>'s formula (sums about the first), so held
    /// and counted positions give the same double.</summary>
    private static double Mean<TPositions>(TPositions x, int n)
        where TPositions : IPositionReader, allows ref struct
    {
        var shift = x[0];
        var sum = 0.0;
        for (var i = 0; i < n; i++)
        {
            sum += x[i] - shift;
        }

        return shift + (sum / n);
    }

    private static OrderTrendResult NotTestable(string reason) => new(double.NaN, double.NaN, double.NaN, double.NaN, double.NaN, reason);
}
