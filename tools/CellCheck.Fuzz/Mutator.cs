using System.Text;

namespace CellCheck.Fuzz;

/// <summary>
/// Mutates an input the way coverage-guided fuzzers do: bit flips, interesting bytes, deletions, duplications,
/// splices with another input, and insertions of tokens that matter to delimited text and YAML.
/// </summary>
internal sealed class Mutator(Random random)
{
    private static readonly byte[][] Tokens = new[]
    {
        ",", ";", "\t", "|", "\"", "\"\"", "\r\n", "\r", "\n", " ", "NA", "-", "NaN", "Inf", "-Infinity", "1e308", "-1e308",
        "1e-320", "1e100", "79228162514264337593543950335", "-79228162514264337593543950335", "1.234,5", "1,5", "0", "-0",
        "1000000000.000001", "2026-03-01T08:30:00", "\u00e9", "\u00ff", "\U0001F600", "\uFEFF",
        "&a ", "*a", "&b [*a, *a]", "!!binary ", "!!python/object:os.system ", "!t ", "- ", ": ", "{", "}", "[", "]", "? ", "---\n",
        "...\n", "|\n", ">-\n", "#", "%YAML 1.1\n", "<<: *a\n", "data: data.csv\n", "factors: ", "responses: ", "blocks: ",
        "model: ", "run_order: ", "alpha: ", "adjust: ", "adjust_across: ", "where: ", "missing: ", "delimiter: ", "decimal: ",
        "thousands: ", "sheet: ", "header_row: ", "kind: numeric", "column: ", "name: ", "unit: ", "full", "main", "a*b", "a*a",
        "file", "holm", "bh", "0.5", "0.05", "1e-9", "cells-and-responses", "a", "b", "y", "z", "run",
    }.Select(t => Encoding.UTF8.GetBytes(t)).Concat([[0], [0xE9], [0xC3], [0xFF, 0xFE], [0xEF, 0xBB, 0xBF], [0xED, 0xA0, 0x80]]).ToArray();

    public byte[] Mutate(byte[] input, byte[] other)
    {
        var data = new List<byte>(input);
        var rounds = 1 + random.Next(random.Next(2) == 0 ? 3 : 12);
        for (var r = 0; r < rounds; r++)
        {
            var at = random.Next(data.Count + 1);
            switch (random.Next(10))
            {
                case 0 when data.Count > 0:
                    at = Math.Min(at, data.Count - 1);
                    data[at] ^= (byte)(1 << random.Next(8));
                    break;
                case 1 when data.Count > 0:
                    data[Math.Min(at, data.Count - 1)] = (byte)random.Next(256);
                    break;
                case 2 or 3 or 4:
                    data.InsertRange(at, Tokens[random.Next(Tokens.Length)]);
                    break;
                case 5 when data.Count > 0:
                    var length = Math.Min(data.Count - Math.Min(at, data.Count - 1), 1 + random.Next(16));
                    data.RemoveRange(Math.Min(at, data.Count - 1), length);
                    break;
                case 6 when data.Count > 0:
                    var start = random.Next(data.Count);
                    var copy = data.GetRange(start, Math.Min(data.Count - start, 1 + random.Next(64)));
                    for (var k = random.Next(4) == 0 ? random.Next(50) : 1; k > 0; k--)
                    {
                        data.InsertRange(at, copy);
                    }

                    break;
                case 7 when other.Length > 0:
                    var from = random.Next(other.Length);
                    data.InsertRange(at, other.AsSpan(from, Math.Min(other.Length - from, 1 + random.Next(128))).ToArray());
                    break;
                case 8 when data.Count > 0:
                    var line = data.IndexOf((byte)'\n', Math.Min(at, data.Count - 1));
                    if (line >= 0)
                    {
                        data.InsertRange(line + 1, data.GetRange(0, line + 1));
                    }

                    break;
                default:
                    data.Insert(at, (byte)random.Next(256));
                    break;
            }
        }

        return data.Count > 1 << 20 ? data.GetRange(0, 1 << 20).ToArray() : data.ToArray();
    }
}
