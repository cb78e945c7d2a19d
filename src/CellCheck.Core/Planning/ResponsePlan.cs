namespace CellCheck.Core.Planning;

/// <summary>
/// The plan for one response: the within-cell SD used (given, or the pooled residual SD of the data with its degrees of
/// freedom), the replicates per cell the data hold now (their mean, rounded down, when unbalanced), and one plan per
/// model term. <see cref="Reason"/> says why the terms could not be planned (no SD), with the terms then empty.
/// </summary>
public sealed record ResponsePlan(
    string Response,
    string? Unit,
    double Sd,
    bool SdFromData,
    int SdDf,
    int CurrentReplicates,
    bool Balanced,
    IReadOnlyList<TermPlan> Terms,
    string? Reason);
