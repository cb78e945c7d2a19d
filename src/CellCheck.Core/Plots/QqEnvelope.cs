namespace CellCheck.Core.Plots;

/// <summary>
/// A pointwise envelope of a normal QQ plot in standardised units, one bound pair per order statistic i = 1..n:
/// a sample standardised by its own <see cref="QuartileLine"/> has its i-th value inside [Lower[i], Upper[i]] with the
/// probability <see cref="Coverage"/> (see <see cref="QqEnvelopes"/>).
/// </summary>
public sealed record QqEnvelope(IReadOnlyList<double> Lower, IReadOnlyList<double> Upper, double Coverage)
{
    /// <summary>The envelope on the data scale of a sample whose quartile line is <paramref name="line"/>:
    /// bound = intercept + slope · standardised bound.</summary>
    public (double[] Lower, double[] Upper) Map(LineCoefficients line)
    {
        ArgumentNullException.ThrowIfNull(line);
        var lower = new double[Lower.Count];
        var upper = new double[Upper.Count];
        for (var i = 0; i < lower.Length; i++)
        {
            lower[i] = line.Intercept + (line.Slope * Lower[i]);
            upper[i] = line.Intercept + (line.Slope * Upper[i]);
        }

        return (lower, upper);
    }
}
