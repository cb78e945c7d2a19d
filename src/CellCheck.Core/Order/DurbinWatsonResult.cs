namespace CellCheck.Core.Order;

/// <summary>
/// The Durbin-Watson test on residuals in run order: the statistic <paramref name="D"/>, its p-value against
/// <paramref name="Alternative"/>, and the exact null mean and variance of d for this design.
/// </summary>
/// <param name="D">d = Σ(e_t − e_{t−1})² / Σ e_t², between 0 and 4.</param>
/// <param name="P">The p-value against <paramref name="Alternative"/>.</param>
/// <param name="ExpectedD">E[d] = tr(MA) / (n − p) under independent normal errors; not 2 in general.</param>
/// <param name="VarianceD">Var[d] under independent normal errors.</param>
/// <param name="Method"><see cref="OrderMethods.Exact"/>, <see cref="OrderMethods.NormalApproximation"/>, or
/// <see cref="OrderMethods.None"/> when not testable.</param>
/// <param name="Alternative">The alternative the p-value refers to.</param>
/// <param name="Reason">A <see cref="Statistics.NotTestableReason"/> code when not testable (D and P are then NaN).</param>
public sealed record DurbinWatsonResult(
    double D,
    double P,
    double ExpectedD,
    double VarianceD,
    string Method,
    DurbinWatsonAlternative Alternative,
    string? Reason = null)
{
    /// <summary>True when the statistic and the p-value are available.</summary>
    public bool IsTestable => Reason is null;
}
