namespace CellCheck.Core.Statistics;

/// <summary>How a family of p-values is adjusted for multiple testing (see <see cref="PValueAdjustment"/>).</summary>
public enum AdjustMethod
{
    /// <summary>No adjustment: the p-values are returned unchanged.</summary>
    None,

    /// <summary>Holm (1979) step-down: controls the family-wise error rate under any dependence.</summary>
    Holm,

    /// <summary>Benjamini &amp; Hochberg (1995) step-up: controls the false discovery rate for independent or
    /// positively dependent tests.</summary>
    BenjaminiHochberg,
}
