namespace CellCheck.Core.Statistics;

/// <summary>The centre about which absolute deviations are taken in an absolute-deviation spread test.</summary>
internal enum SpreadCentre
{
    /// <summary>The group mean (Levene 1960).</summary>
    Mean,

    /// <summary>The group median (Brown &amp; Forsythe 1974).</summary>
    Median,
}
