namespace CellCheck.Core.Statistics;

/// <summary>
/// The outcome of one hypothesis test on one sample or one set of groups: the statistic,
/// its degrees of freedom where the reference distribution has them, and the p-value.
/// A test that cannot be computed carries a <see cref="Reason"/> code (see <see cref="NotTestableReason"/>)
/// and NaN numbers; a statistic that can be computed but whose p-value approximation is not valid
/// (Shapiro-Wilk above n = 5000) keeps its statistic and has a reason and a NaN p.
/// </summary>
public sealed record TestOutcome(double Statistic, double P, double? Df1 = null, double? Df2 = null, string? Reason = null)
{
    /// <summary>True when both the statistic and the p-value are available.</summary>
    public bool IsTestable => Reason is null;

    /// <summary>An outcome for a test that cannot be computed on this data.</summary>
    public static TestOutcome NotTestable(string reason) => new(double.NaN, double.NaN, null, null, reason);
}
