namespace CellCheck.Core.Order;

/// <summary>The departure from independence that a Durbin-Watson p-value is computed against.</summary>
public enum DurbinWatsonAlternative
{
    /// <summary>Positive first-order autocorrelation (neighbouring runs alike, small d): p = P(d ≤ d_obs).</summary>
    Positive = 0,

    /// <summary>Negative first-order autocorrelation (neighbouring runs alternate, large d): p = P(d ≥ d_obs).</summary>
    Negative = 1,

    /// <summary>Either sign: p = 2 min(P(d ≤ d_obs), P(d ≥ d_obs)), at most 1.</summary>
    TwoSided = 2,
}
