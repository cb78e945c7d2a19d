namespace CellCheck.Core.Statistics;

/// <summary>Stable reason codes for a test that cannot be computed. Codes never change meaning across versions.</summary>
public static class NotTestableReason
{
    /// <summary>Fewer values than the method needs (Shapiro-Wilk 3, Anderson-Darling 8, D'Agostino-Pearson 8;
    /// Durbin-Watson p + 2 for p design columns; order trend 3; runs test 3 off the median with both sides present).</summary>
    public const string TooFewValues = "too-few-values";

    /// <summary>All values identical (or residuals all zero): no spread to standardise by. The order trend also
    /// reports it when every run-order value is the same.</summary>
    public const string ZeroSpread = "zero-spread";

    /// <summary>More values than the p-value approximation is valid for (Shapiro-Wilk above 5000).</summary>
    public const string TooManyValues = "too-many-values";

    /// <summary>Fewer than two groups with at least two values each.</summary>
    public const string TooFewGroups = "too-few-groups";

    /// <summary>Every group has two values: absolute deviations from the centre are equal within each group, so the
    /// within-group variation of the deviations is zero and the F ratio is degenerate.</summary>
    public const string AllGroupsOfTwo = "all-groups-of-two";

    /// <summary>At least one group has zero variance, so its log-variance is minus infinity (Bartlett).</summary>
    public const string ZeroVarianceGroup = "zero-variance-group";

    /// <summary>The within-group variation of the statistic's working values is zero: the F ratio is undefined.</summary>
    public const string DegenerateWithinGroups = "degenerate-within-groups";

    /// <summary>No residual degrees of freedom remain (every cell a singleton).</summary>
    public const string NoResidualDegreesOfFreedom = "no-residual-df";

    /// <summary>No rows share identical settings of every factor and block, so there is no pure error.</summary>
    public const string NoPureError = "no-pure-error";

    /// <summary>The model already fits every distinct setting: no lack-of-fit degrees of freedom remain.</summary>
    public const string SaturatedModel = "saturated-model";

    /// <summary>The model has interaction terms; the check applies to additive models.</summary>
    public const string NotAdditive = "not-additive";

    /// <summary>Too few residual degrees of freedom for the check.</summary>
    public const string TooFewResidualDf = "too-few-residual-df";

    /// <summary>No run order was declared: independence cannot be checked.</summary>
    public const string NoRunOrder = "no-run-order";
}
