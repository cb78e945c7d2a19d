namespace CellCheck.Core.Planning;

/// <summary>The census verdict on replication: are there enough replicates for the assumption checks to see anything?</summary>
public enum ReplicationLevel
{
    /// <summary>Every cell replicated enough and enough residual degrees of freedom, no empty or singleton cells.</summary>
    Adequate,

    /// <summary>Replicated, but short on one of the criteria: the checks see little.</summary>
    Marginal,

    /// <summary>No cell holds two or more values, or no residual degrees of freedom remain.</summary>
    Unreplicated,
}
