namespace CellCheck.Core.Order;

/// <summary>Stable names for how a run-order p-value was obtained.</summary>
public static class OrderMethods
{
    /// <summary>From the exact null distribution of the statistic.</summary>
    public const string Exact = "exact";

    /// <summary>From a normal distribution with the statistic's exact null mean and variance.</summary>
    public const string NormalApproximation = "normal-approximation";

    /// <summary>No p-value: the test was not testable on this data.</summary>
    public const string None = "none";
}
