namespace CellCheck.Core.Statistics;

/// <summary>
/// Moment statistics of one sample. <see cref="Variance"/> and <see cref="StandardDeviation"/> use divisor n − 1;
/// <see cref="Skewness"/> and <see cref="ExcessKurtosis"/> are the moment estimators g1 = m3/m2^(3/2) and
/// g2 = m4/m2² − 3 with m_k = Σ (x − x̄)ᵏ / n (no small-sample bias correction). Undefined values are NaN.
/// </summary>
/// <param name="Count">Number of values.</param>
/// <param name="Mean">Arithmetic mean; NaN when empty.</param>
/// <param name="Variance">Sample variance, divisor n − 1; NaN when n &lt; 2.</param>
/// <param name="StandardDeviation">Square root of <paramref name="Variance"/>; NaN when n &lt; 2.</param>
/// <param name="Skewness">g1; NaN when n &lt; 3 or the values have no spread.</param>
/// <param name="ExcessKurtosis">g2; NaN when n &lt; 4 or the values have no spread.</param>
public sealed record MomentSummary(
    int Count,
    double Mean,
    double Variance,
    double StandardDeviation,
    double Skewness,
    double ExcessKurtosis);
