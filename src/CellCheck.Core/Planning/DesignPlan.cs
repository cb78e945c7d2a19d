namespace CellCheck.Core.Planning;

/// <summary>The plan for a design: the balanced design planned for, what was asked, the configuration the stated effect
/// is placed in, one plan per response, and the replicates each single check needs.</summary>
public sealed record DesignPlan(
    PlannedDesign Design,
    PlanRequest Request,
    string Configuration,
    IReadOnlyList<ResponsePlan> Responses,
    IReadOnlyList<SensitivityNeed> Checks);
