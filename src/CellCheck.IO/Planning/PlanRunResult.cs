using CellCheck.Core.Planning;
using CellCheck.IO.Design;

namespace CellCheck.IO.Planning;

/// <summary>The design that was read and its plan.</summary>
public sealed record PlanRunResult(DesignFile Design, DesignPlan Plan);
