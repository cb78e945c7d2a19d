namespace CellCheck.Core.Analysis;

/// <summary>Status of one check: it ran and raised no doubt, it ran and raised doubt, or it could not run.</summary>
public enum CheckStatus
{
    /// <summary>The check ran and found no evidence against the assumption at the chosen alpha.</summary>
    Pass,

    /// <summary>The check ran and found evidence against the assumption.</summary>
    Flag,

    /// <summary>The check could not be computed; a reason code says why.</summary>
    NotTestable,
}
