using CellCheck.Core.Models;
using CellCheck.Core.Planning;

namespace CellCheck.Core.Tests.Planning;

/// <summary>Planned designs used by the planning tests.</summary>
internal static class PlanningDesigns
{
    /// <summary>A one-way layout of k groups.</summary>
    public static PlannedDesign OneWay(int k) => new([new PlannedFactor("group", k)], ModelSpec.Full(1).Terms);

    /// <summary>The coating trial's layout: cure_temp numeric at 160, 180, 200; line_speed and primer at two levels; full model.</summary>
    public static PlannedDesign Coating() => new(
        [new PlannedFactor("cure_temp", 3, [160, 180, 200]), new PlannedFactor("line_speed", 2), new PlannedFactor("primer", 2)],
        ModelSpec.Full(3).Terms);

    /// <summary>Categorical 3 × 2 × 2, full model.</summary>
    public static PlannedDesign ThreeByTwoByTwo() =>
        new([new PlannedFactor("a", 3), new PlannedFactor("b", 2), new PlannedFactor("c", 2)], ModelSpec.Full(3).Terms);
}
