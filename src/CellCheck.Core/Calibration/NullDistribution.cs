namespace CellCheck.Core.Calibration;

/// <summary>
/// A simulated null distribution of a statistic (larger = more evidence). The Monte Carlo p-value of an observed
/// statistic t is (1 + #{simulated ≥ t}) / (B + 1), which keeps the false-alarm rate at or below alpha for any
/// number of draws B (Davison &amp; Hinkley 1997, section 4.2.1).
/// </summary>
public sealed class NullDistribution
{
    private readonly double[] _sorted;

    public NullDistribution(IEnumerable<double> simulated)
    {
        ArgumentNullException.ThrowIfNull(simulated);
        _sorted = simulated.Where(double.IsFinite).Order().ToArray();
    }

    /// <summary>Number of simulated statistics (finite ones).</summary>
    public int Draws => _sorted.Length;

    /// <summary>The Monte Carlo p-value of <paramref name="statistic"/>; NaN for NaN.</summary>
    public double PValue(double statistic)
    {
        if (double.IsNaN(statistic) || _sorted.Length == 0)
        {
            return double.NaN;
        }

        // first index whose value is >= statistic
        int lo = 0, hi = _sorted.Length;
        while (lo < hi)
        {
            var mid = (lo + hi) >>> 1;
            if (_sorted[mid] < statistic)
            {
                lo = mid + 1;
            }
            else
            {
                hi = mid;
            }
        }

        return (1.0 + (_sorted.Length - lo)) / (_sorted.Length + 1.0);
    }
}
