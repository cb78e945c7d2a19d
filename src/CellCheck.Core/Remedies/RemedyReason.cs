namespace CellCheck.Core.Remedies;

/// <summary>Stable reason codes for a remedy that cannot be computed or applied. Codes never change meaning.</summary>
public static class RemedyReason
{
    /// <summary>A value (or a cell mean, for the spread-versus-level fit) is zero or negative: Box-Cox powers and logs
    /// need positive values.</summary>
    public const string NonPositiveValues = "non-positive-values";

    /// <summary>Fewer than three cells with two or more values, a positive mean and a positive SD.</summary>
    public const string TooFewCells = "too-few-cells";

    /// <summary>Every cell has the same mean: spread cannot be related to level.</summary>
    public const string NoLevelSpread = "no-level-spread";

    /// <summary>The model leaves no residual degrees of freedom: there is no likelihood to profile.</summary>
    public const string NoResidualDf = "no-residual-df";

    /// <summary>The residuals are all zero: every λ fits exactly.</summary>
    public const string ZeroSpread = "zero-spread";

    /// <summary>A transformation was requested but λ = 1 is inside the interval: nothing was applied.</summary>
    public const string NotNeeded = "not-needed";

    /// <summary>The transformed values overflow or underflow double precision (a large |power| on extreme values):
    /// nothing was re-checked.</summary>
    public const string NotFinite = "not-finite";

    /// <summary>No power could be estimated, so "auto" had nothing to apply.</summary>
    public const string NoEstimate = "no-estimate";
}
