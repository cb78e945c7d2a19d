using System.Globalization;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Support;

/// <summary>Reads a small comma-separated fixture (header row, no quoting) into groups.</summary>
internal static class CsvGroups
{
    /// <summary>Groups the numeric column <paramref name="valueColumn"/> by the combination of the
    /// <paramref name="groupColumns"/>, groups in order of first appearance; <paramref name="transform"/> is applied to
    /// each value.</summary>
    public static GroupedValues Load(string file, string valueColumn, string[] groupColumns, Func<double, double>? transform = null)
    {
        var lines = File.ReadAllLines(Fixture.Path(file)).Where(l => l.Length > 0).ToArray();
        var header = lines[0].Split(',');
        var valueIndex = Array.IndexOf(header, valueColumn);
        var groupIndexes = groupColumns.Select(c => Array.IndexOf(header, c)).ToArray();
        Assert.True(valueIndex >= 0 && groupIndexes.All(i => i >= 0), $"columns missing in {file}");
        var groups = new List<List<double>>();
        var keys = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var line in lines.Skip(1))
        {
            var fields = line.Split(',');
            var key = string.Join("|", groupIndexes.Select(i => fields[i]));
            if (!keys.TryGetValue(key, out var g))
            {
                g = groups.Count;
                keys.Add(key, g);
                groups.Add([]);
            }

            var value = double.Parse(fields[valueIndex], NumberStyles.Float, CultureInfo.InvariantCulture);
            groups[g].Add(transform is null ? value : transform(value));
        }

        return GroupedValues.FromGroups(groups.Select(g => g.ToArray()).ToArray());
    }

    public static GroupedValues Load(string file, string valueColumn, string groupColumn) => Load(file, valueColumn, [groupColumn]);
}
