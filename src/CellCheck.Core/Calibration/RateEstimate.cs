namespace CellCheck.Core.Calibration;

/// <summary>
/// A proportion estimated by simulation, with its Wilson score 95% interval (Wilson 1927) and standard error.
/// </summary>
public sealed record RateEstimate(int Hits, int Draws)
{
    private const double Z = 1.959963984540054;

    public double Rate => Draws == 0 ? double.NaN : (double)Hits / Draws;

    public double StandardError => Draws == 0 ? double.NaN : Math.Sqrt(Rate * (1 - Rate) / Draws);

    public double Lower => Bound(-1);

    public double Upper => Bound(1);

    private double Bound(int sign)
    {
        if (Draws == 0)
        {
            return double.NaN;
        }

        var n = (double)Draws;
        var p = Rate;
        var centre = p + (Z * Z / (2 * n));
        var half = Z * Math.Sqrt((p * (1 - p) / n) + (Z * Z / (4 * n * n)));
        return Math.Clamp((centre + (sign * half)) / (1 + (Z * Z / n)), 0, 1);
    }
}
