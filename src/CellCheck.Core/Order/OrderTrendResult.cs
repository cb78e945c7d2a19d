namespace CellCheck.Core.Order;

/// <summary>The least-squares trend of residuals over run order.</summary>
/// <param name="Slope">Change in residual per unit of run order (per run when positions are used).</param>
/// <param name="StandardError">Standard error of the slope, s / √Σ(t − t̄)² with s² = SSE / (n − 2).</param>
/// <param name="T">Slope / StandardError.</param>
/// <param name="Df">n − 2.</param>
/// <param name="P">Two-sided p from Student's t with <paramref name="Df"/> degrees of freedom.</param>
/// <param name="Reason">A <see cref="Statistics.NotTestableReason"/> code when not testable (numbers are then NaN).</param>
public sealed record OrderTrendResult(double Slope, double StandardError, double T, double Df, double P, string? Reason = null)
{
    /// <summary>True when the slope, its t and p are available.</summary>
    public bool IsTestable => Reason is null;
}
