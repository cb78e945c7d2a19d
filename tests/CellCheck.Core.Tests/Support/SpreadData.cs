using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Support;

/// <summary>The reference data sets of the spread tests, by a short name used in test data rows.</summary>
internal static class SpreadData
{
    public static GroupedValues Load(string name) => name switch
    {
        "gear" => CsvGroups.Load("gear.csv", "diameter", "batch"),
        "insect-sprays" => CsvGroups.Load("insect-sprays.csv", "count", "spray"),
        "plant-growth" => CsvGroups.Load("plant-growth.csv", "weight", "group"),
        "poisons-time" => CsvGroups.Load("poisons.csv", "time", ["poison", "treat"]),
        "poisons-rate" => CsvGroups.Load("poisons.csv", "time", ["poison", "treat"], t => 1.0 / t),
        "hollander-wolfe" => CsvGroups.Load("hollander-wolfe.csv", "value", "group"),
        "zero-spread" => GroupedValues.FromGroups([[1.0, 1.0, 1.0], [1.0, 2.0, 3.0], [2.0, 4.0, 7.0]]),
        _ => throw new ArgumentOutOfRangeException(nameof(name), name, "unknown data set"),
    };

    /// <summary>The same groups with a group of one value (<paramref name="value"/>) and an empty group appended.</summary>
    public static GroupedValues WithSingletonAndEmpty(GroupedValues groups, double value)
    {
        var list = Enumerable.Range(0, groups.GroupCount).Select(g => groups.Group(g).ToArray()).ToList();
        list.Add([value]);
        list.Add([]);
        return GroupedValues.FromGroups(list);
    }
}
