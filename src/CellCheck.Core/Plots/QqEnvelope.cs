namespace CellCheck.Core.Plots;

/// <summary>
/// A pointwise envelope of a normal QQ plot in standardised units, one bound pair per order statistic i = 1..n:
/// a normal sample standardised by its own mean and SD has its i-th value inside [Lower[i], Upper[i]] with the
/// probability <see cref="Coverage"/> (see <see cref="QqEnvelopes"/>).
/// </summary>
public sealed record QqEnvelope(IReadOnlyList<double> Lower, IReadOnlyList<double> Upper, double Coverage)
{
    /// <summary>The envelope on the data scale of values with mean <paramref name="mean"/> and standard deviation
    /// <paramref name="sd"/>: bound = mean + sd · standardised bound.</summary>
    public (double[] Lower, double[] Upper) Map(double mean, double sd)
    {
        var lower = new double[Lower.Count];
        var upper = new double[Upper.Count];
        for (var i = 0; i < lower.Length; i++)
        {
            lower[i] = mean + (sd * Lower[i]);
            upper[i] = mean + (sd * Upper[i]);
        }

        return (lower, upper);
    }
}
