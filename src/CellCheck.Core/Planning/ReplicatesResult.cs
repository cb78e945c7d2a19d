namespace CellCheck.Core.Planning;

/// <summary>
/// Are there enough replicates? The census verdict with its rule, the residual degrees of freedom it used, the
/// simulated sensitivity of every single check at the design's cell sizes, and a summary in plain words.
/// </summary>
public sealed record ReplicatesResult(CensusVerdict Census, int ResidualDf, SensitivityTable Sensitivity, IReadOnlyList<string> Summary);
