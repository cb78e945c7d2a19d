namespace CellCheck.Core.Order;

/// <summary>The runs test about the median for values in run order.</summary>
/// <param name="Runs">Number of runs of consecutive values on the same side of the median.</param>
/// <param name="N1">Values below the median.</param>
/// <param name="N2">Values above the median.</param>
/// <param name="Dropped">Values equal to the median, left out before counting runs.</param>
/// <param name="Median">The median of all values.</param>
/// <param name="Expected">E[R] = 1 + 2 n1 n2 / n under random order (n = n1 + n2).</param>
/// <param name="Variance">Var[R] = 2 n1 n2 (2 n1 n2 − n) / (n²(n − 1)).</param>
/// <param name="Z">(R − E[R]) / √Var[R], without continuity correction.</param>
/// <param name="P">Two-sided p: exact when n1, n2 ≤ 20, otherwise equal to <paramref name="PNormal"/>.</param>
/// <param name="PNormal">Two-sided p from the normal approximation, 2(1 − Φ(|Z|)).</param>
/// <param name="Method"><see cref="OrderMethods.Exact"/>, <see cref="OrderMethods.NormalApproximation"/>, or
/// <see cref="OrderMethods.None"/> when not testable.</param>
/// <param name="Reason">A <see cref="Statistics.NotTestableReason"/> code when not testable.</param>
public sealed record RunsTestResult(
    int Runs,
    int N1,
    int N2,
    int Dropped,
    double Median,
    double Expected,
    double Variance,
    double Z,
    double P,
    double PNormal,
    string Method,
    string? Reason = null)
{
    /// <summary>True when the run count could be referred to its null distribution.</summary>
    public bool IsTestable => Reason is null;
}
