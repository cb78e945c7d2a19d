using System.Diagnostics;
using nietras.SeparatedValues;

namespace CellCheck.Benchmarks;

/// <summary>
/// The parse floor: one bare Sep pass over a benchmark file that parses every numeric field and touches every text
/// field, keeping nothing. No tool that reads the file can be faster than this on the same machine.
/// </summary>
internal static class ParseFloor
{
    public static (double Seconds, long Rows, double Checksum) Run(string path)
    {
        var clock = Stopwatch.StartNew();
        using var reader = Sep.Reader(o => o with { DisableColCountCheck = true }).FromFile(path);
        var columns = reader.Header.ColNames.Count;
        long rows = 0;
        double checksum = 0;
        foreach (var row in reader)
        {
            for (var c = 0; c < columns; c++)
            {
                var span = row[c].Span;
                if (span.Length > 0 && (char.IsAsciiDigit(span[0]) || span[0] == '-'))
                {
                    checksum += double.Parse(span, System.Globalization.CultureInfo.InvariantCulture);
                }
                else
                {
                    checksum += span.Length;
                }
            }

            rows++;
        }

        return (clock.Elapsed.TotalSeconds, rows, checksum);
    }
}
