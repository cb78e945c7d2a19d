using System.Globalization;
using System.Text.RegularExpressions;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Support;

/// <summary>
/// Reads a NIST StRD one-way ANOVA file as laid out in Fixtures/nist-strd: a header whose "Data (lines A to B)" entry
/// gives the data lines, each data line holding one value per treatment (column j = treatment j).
/// Values are kept as their original text so a test can parse them as double or as decimal.
/// </summary>
internal sealed partial class NistAnovaFile
{
    private NistAnovaFile(string[][] columns) => Columns = columns;

    /// <summary>The values of each treatment, as written in the file.</summary>
    public string[][] Columns { get; }

    public static NistAnovaFile Load(string name)
    {
        var lines = File.ReadAllLines(Fixture.Path(Path.Combine("nist-strd", name + ".dat")));
        var range = lines.Select(l => DataLines().Match(l)).First(m => m.Success);
        var first = int.Parse(range.Groups[1].Value, CultureInfo.InvariantCulture);
        var last = int.Parse(range.Groups[2].Value, CultureInfo.InvariantCulture);
        var rows = lines[(first - 1)..last]
            .Select(l => l.Split(' ', StringSplitOptions.RemoveEmptyEntries))
            .ToArray();
        var width = rows[0].Length;
        Assert.All(rows, r => Assert.Equal(width, r.Length));
        var columns = Enumerable.Range(0, width).Select(j => rows.Select(r => r[j]).ToArray()).ToArray();
        return new NistAnovaFile(columns);
    }

    /// <summary>Every value parsed directly as double (correctly rounded), grouped by treatment.</summary>
    public GroupedValues ParseAsDouble() => GroupedValues.FromGroups(
        Columns.Select(c => c.Select(v => double.Parse(v, NumberStyles.Float, CultureInfo.InvariantCulture)).ToArray()).ToArray());

    /// <summary>Every value parsed as decimal, shifted by the first value in decimal (<see cref="ExactCentring"/>),
    /// then converted to double, grouped by treatment.</summary>
    public GroupedValues ParseCentred()
    {
        var all = Columns.SelectMany(c => c).Select(v => decimal.Parse(v, NumberStyles.Float, CultureInfo.InvariantCulture)).ToArray();
        var centred = ExactCentring.Centre(all, out _);
        var starts = new int[Columns.Length + 1];
        for (var j = 0; j < Columns.Length; j++)
        {
            starts[j + 1] = starts[j] + Columns[j].Length;
        }

        return new GroupedValues(centred, starts);
    }

    [GeneratedRegex(@"Data\s+\(lines\s+(\d+)\s+to\s+(\d+)\)")]
    private static partial Regex DataLines();
}
