using System.Diagnostics;
using System.Globalization;
using System.Text;
using CellCheck.IO.Data;

namespace CellCheck.Benchmarks;

/// <summary>Times the per-row label lookup of the reader: the first four label columns of the first two million rows
/// of a screen file, interned with a span-lookup dictionary and with <see cref="LabelTable"/>: <c>intern FILE</c>.</summary>
internal static class InternTiming
{
    public static void Run(string path)
    {
        var text = new StringBuilder();
        var cells = new List<(int Start, int Length)>();
        foreach (var line in File.ReadLines(path).Skip(1).Take(2_000_000))
        {
            var fields = line.Split(',');
            for (var c = 1; c <= 4; c++)
            {
                cells.Add((text.Length, fields[c].Length));
                text.Append(fields[c]);
            }
        }

        var all = text.ToString();
        for (var round = 0; round < 3; round++)
        {
            var clock = Stopwatch.StartNew();
            var dictionaries = Enumerable.Range(0, 4).Select(_ => new Dictionary<string, int>(StringComparer.Ordinal)).ToArray();
            var first = 0L;
            for (var k = 0; k < cells.Count; k++)
            {
                var lookup = dictionaries[k & 3].GetAlternateLookup<ReadOnlySpan<char>>();
                var span = all.AsSpan(cells[k].Start, cells[k].Length);
                if (!lookup.TryGetValue(span, out var code))
                {
                    code = dictionaries[k & 3].Count;
                    dictionaries[k & 3].Add(span.ToString(), code);
                }

                first += code;
            }

            var dictionary = clock.Elapsed.TotalSeconds;
            clock.Restart();
            var tables = Enumerable.Range(0, 4).Select(_ => new LabelTable()).ToArray();
            var second = 0L;
            for (var k = 0; k < cells.Count; k++)
            {
                second += tables[k & 3].Intern(all.AsSpan(cells[k].Start, cells[k].Length));
            }

            var table = clock.Elapsed.TotalSeconds;
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"{cells.Count} labels: dictionary {dictionary:F3} s, label table {table:F3} s (codes agree: {first == second})"));
        }
    }
}
