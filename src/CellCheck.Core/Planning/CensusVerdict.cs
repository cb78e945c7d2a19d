namespace CellCheck.Core.Planning;

/// <summary>The census verdict of one response, the rule it was decided by (thresholds and their sources) and the
/// reasons that placed it below adequate.</summary>
public sealed record CensusVerdict(ReplicationLevel Level, string Rule, IReadOnlyList<string> Reasons);
