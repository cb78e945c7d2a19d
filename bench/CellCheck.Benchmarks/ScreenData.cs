using System.Globalization;
using System.Text;

namespace CellCheck.Benchmarks;

/// <summary>
/// Invented, seeded benchmark data: a sensor-logged dispensing screen. Three categorical factors (dispense head,
/// reagent lot, dose step) define the cells; a day column is a block; a sequence number is the run order (rows are
/// logged in time, with the cells interleaved at random). The signal is a cell mean plus a day shift plus normal noise;
/// a handful of cells are given skewed noise and one cell twice the spread, so the check has something to find.
/// </summary>
internal static class ScreenData
{
    public const int Seed = 97531;

    /// <summary>Factor level counts for a cell count: 1 000 = 10 × 10 × 10, 10 000 = 25 × 20 × 20.</summary>
    public static (int Heads, int Lots, int Doses) Shape(int cells) => cells switch
    {
        1000 => (10, 10, 10),
        10000 => (25, 20, 20),
        _ => throw new ArgumentOutOfRangeException(nameof(cells), cells, "supported cell counts: 1000, 10000"),
    };

    public static void Write(string csvPath, long rows, int cells, int days)
    {
        var (heads, lots, doses) = Shape(cells);
        var random = new Random(Seed);
        var cellMean = new double[cells];
        for (var c = 0; c < cells; c++)
        {
            cellMean[c] = 100 + (20 * random.NextDouble());
        }

        var dayShift = new double[days];
        for (var d = 0; d < days; d++)
        {
            dayShift[d] = 2 * (random.NextDouble() - 0.5);
        }

        using var stream = new FileStream(csvPath, FileMode.CreateNew, FileAccess.Write, FileShare.None, 1 << 20);
        using var writer = new StreamWriter(stream, new UTF8Encoding(false), 1 << 20);
        writer.Write("seq,head,reagent_lot,dose,day,signal\n");
        Span<char> buffer = stackalloc char[32];
        var normal = new Gaussian(random);
        for (long i = 0; i < rows; i++)
        {
            var cell = random.Next(cells);
            var day = (int)(i * days / rows);
            var noise = normal.Next();
            if (cell % 997 == 13)
            {
                noise = Math.Exp(noise) - 1.6487; // lognormal(0, 1) shifted to mean zero: a skewed cell
            }
            else if (cell == cells / 2)
            {
                noise *= 2; // one cell with twice the spread
            }

            var signal = cellMean[cell] + dayShift[day] + noise;
            var h = cell / (lots * doses);
            var l = cell / doses % lots;
            var s = cell % doses;
            writer.Write(i + 1);
            writer.Write(",h");
            Write2(writer, h + 1);
            writer.Write(",L");
            Write2(writer, l + 1);
            writer.Write(",d");
            Write2(writer, s + 1);
            writer.Write(',');
            writer.Write(day + 1);
            writer.Write(',');
            signal.TryFormat(buffer, out var written, "F3", CultureInfo.InvariantCulture);
            writer.Write(buffer[..written]);
            writer.Write('\n');
        }
    }

    public static void WriteDesign(string yamlPath, string csvName)
    {
        File.WriteAllText(yamlPath, $"""
            # Benchmark design (invented data, seed {Seed}): a sensor-logged dispensing screen.
            data: {csvName}
            factors: [head, reagent_lot, dose]
            blocks: [day]
            responses:
              - column: signal
                unit: RFU
            run_order: seq
            """ + "\n");
    }

    private static void Write2(StreamWriter writer, int value)
    {
        writer.Write((char)('0' + (value / 10)));
        writer.Write((char)('0' + (value % 10)));
    }
}
