using System.Globalization;
using System.Text.RegularExpressions;

namespace CellCheck.IO.Scaffold;

/// <summary>
/// Proposes a role for each column from its values (rules of thumb, common practice, no source): a run order when
/// the name says so (run, order, sequence, time, date) or the numbers are distinct increasing whole positions (a run or
/// plot number); a block when the
/// name says so (block, day, batch, replicate); a response when most values are numbers and they take many distinct
/// values (more than 10, or a third of the rows); a factor when the values take few distinct levels; otherwise ignore
/// (identifiers, free text).
/// </summary>
public static partial class ColumnProfiler
{
    public static ColumnProfile Profile(string name, IReadOnlyList<string> values)
    {
        ArgumentNullException.ThrowIfNull(values);
        var present = values.Where(v => v.Length > 0 && v != "NA").ToList();
        var numbers = present.Select(v => double.TryParse(v, NumberStyles.Float, CultureInfo.InvariantCulture, out var x) ? x : double.NaN).ToList();
        var numeric = present.Count == 0 ? 0 : numbers.Count(double.IsFinite) / (double)present.Count;
        var distinct = present.Distinct(StringComparer.Ordinal).Count();
        var sorted = numbers.Where(double.IsFinite).Order().ToList();
        var sequence = numeric == 1 && distinct == present.Count && present.Count > 2 && sorted[0] >= 0 && sorted.Zip(sorted.Skip(1)).All(p => p.Second > p.First)
            && sorted.All(x => x == Math.Floor(x)) && sorted[^1] - sorted[0] < 2 * present.Count;
        var time = present.Count > 0 && present.All(v => v.Contains('-', StringComparison.Ordinal) && DateTimeOffset.TryParse(v, CultureInfo.InvariantCulture, DateTimeStyles.AssumeUniversal, out _));
        var role = (OrderName().IsMatch(name) && (sequence || time || numeric == 1)) || sequence ? ColumnRole.RunOrder
            : BlockName().IsMatch(name) && distinct > 1 && distinct < present.Count ? ColumnRole.Block
            : numeric >= 0.9 && (distinct > 10 || distinct * 3 > present.Count) ? ColumnRole.Response
            : distinct > 1 && distinct <= Math.Max(12, present.Count / 4) ? ColumnRole.Factor
            : ColumnRole.Ignore;
        return new ColumnProfile(name, values.Count, distinct, values.Count - present.Count, numeric, sequence, time, role);
    }

    [GeneratedRegex("^(run|runs|run_?order|order|seq|sequence|time|timestamp|date|datetime)(_.*)?$", RegexOptions.IgnoreCase | RegexOptions.CultureInvariant)]
    private static partial Regex OrderName();

    [GeneratedRegex("^(block|blocks|day|batch|replicate|rep|session|plate)(_.*)?$", RegexOptions.IgnoreCase | RegexOptions.CultureInvariant)]
    private static partial Regex BlockName();
}
