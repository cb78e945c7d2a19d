using System.Globalization;
using CellCheck.Core.Data;

namespace CellCheck.Core.Tests.Scale;

/// <summary>
/// Seeded, invented data at the scale of a large screen: three categorical factors whose full factorial gives the
/// cells, a given number of rows per cell, and a run order. The rows are shuffled in the file and again in run order.
/// Each value is 100 + a cell effect (uniform on 0..20) + noise + a slow drift over the run (0.1 from first to last
/// run) + a first-order autoregressive disturbance in run order (coefficient 0.3, innovation SD 0.3), recorded to three
/// decimals. The noise is standard normal, except in the cells whose index is 13 modulo 97 (lognormal(0, 1) shifted
/// to mean zero: skewed cells) and in the middle cell (SD 1.5: one cell of wider spread), so that the checks have
/// something to find. Values are held as the data reader holds them: thousandths minus the first row's, as doubles.
/// </summary>
internal sealed class ScaleDesign
{
    private static readonly string[] FactorNames = ["head", "lot", "dose"];

    private ScaleDesign(int[] levelCounts, int[][] codes, string[][] labels, double[] values, double[] runOrder, DesignData data)
    {
        LevelCounts = levelCounts;
        Codes = codes;
        Labels = labels;
        Values = values;
        RunOrder = runOrder;
        Data = data;
    }

    /// <summary>Levels of each factor.</summary>
    public int[] LevelCounts { get; }

    /// <summary>Level index of each row, per factor.</summary>
    public int[][] Codes { get; }

    /// <summary>Level labels, per factor.</summary>
    public string[][] Labels { get; }

    /// <summary>Response values relative to the origin (the first row's value), per row.</summary>
    public double[] Values { get; }

    /// <summary>Run position of each row (a permutation of 1..N).</summary>
    public double[] RunOrder { get; }

    /// <summary>The same data as the Core pipeline takes it.</summary>
    public DesignData Data { get; }

    /// <summary>
    /// 1 000 000 rows in 10 × 10 × 10 = 1 000 cells of unequal size: eight small cells of 1, 2, 3, 5, 8, 11, 12 and 30
    /// rows (the singleton, pair and small-sample paths of every check), the rest sized in proportion to a seeded weight
    /// uniform on 0.3..1.7 (about 300 to 1 700 rows).
    /// </summary>
    public static ScaleDesign ThousandCells()
    {
        int[] small = [1, 2, 3, 5, 8, 11, 12, 30];
        var random = new Random(20240611);
        var weights = Enumerable.Range(0, 1000 - small.Length).Select(_ => 0.3 + (1.4 * random.NextDouble())).ToArray();
        var rest = 1_000_000 - small.Sum();
        var total = weights.Sum();
        var sizes = small.Concat(weights.Select(w => (int)(rest * w / total))).ToArray();
        sizes[^1] += 1_000_000 - sizes.Sum();
        return Build(4711, [10, 10, 10], sizes);
    }

    /// <summary>1 000 000 rows in 25 × 20 × 20 = 10 000 cells of 100 rows each.</summary>
    public static ScaleDesign TenThousandCells() => Build(8191, [25, 20, 20], Enumerable.Repeat(100, 10_000).ToArray());

    /// <summary>Builds the design; <paramref name="sizes"/> holds the rows of each cell in mixed-radix order of the level indices.</summary>
    public static ScaleDesign Build(int seed, int[] levelCounts, int[] sizes)
    {
        var random = new Random(seed);
        var normal = new SeededNormal(random);
        var cells = sizes.Length;
        var effect = new double[cells];
        for (var c = 0; c < cells; c++)
        {
            effect[c] = 20 * random.NextDouble();
        }

        var rows = sizes.Sum();
        var cellOfRow = new int[rows];
        for (int c = 0, at = 0; c < cells; at += sizes[c], c++)
        {
            Array.Fill(cellOfRow, c, at, sizes[c]);
        }

        Shuffle(cellOfRow, random);
        var position = Enumerable.Range(1, rows).ToArray();
        Shuffle(position, random);
        var disturbance = new double[rows + 1];
        for (var t = 1; t <= rows; t++)
        {
            disturbance[t] = (0.3 * disturbance[t - 1]) + (0.3 * normal.Next());
        }

        var thousandths = new long[rows];
        for (var row = 0; row < rows; row++)
        {
            var c = cellOfRow[row];
            var noise = normal.Next();
            noise = c % 97 == 13 ? Math.Exp(noise) - Math.Exp(0.5) : c == cells / 2 ? 1.5 * noise : noise;
            var t = position[row];
            var signal = 100 + effect[c] + noise + (0.1 * t / rows) + disturbance[t];
            thousandths[row] = (long)Math.Round(signal * 1000);
        }

        var values = thousandths.Select(k => (k - thousandths[0]) / 1000.0).ToArray();
        var codes = LevelCodes(cellOfRow, levelCounts);
        var labels = levelCounts.Select((count, f) => Enumerable.Range(1, count)
            .Select(i => FactorNames[f][0] + i.ToString("D2", CultureInfo.InvariantCulture)).ToArray()).ToArray();
        var runOrder = position.Select(p => (double)p).ToArray();
        var data = new DesignData(
            FactorNames.Select((name, f) => new FactorColumn(name, labels[f], codes[f])).ToArray(),
            [new ResponseColumn("signal", "RFU", thousandths[0] / 1000.0, values) { Decimals = 3 }],
            Enumerable.Range(2, rows).ToArray(),
            [Array.Empty<ExcludedRow>()])
        {
            RunOrder = RunPositions.From(runOrder),
            RunOrderColumn = "seq",
        };
        return new ScaleDesign(levelCounts, codes, labels, values, runOrder, data);
    }

    private static int[][] LevelCodes(int[] cellOfRow, int[] levelCounts)
    {
        var codes = levelCounts.Select(_ => new int[cellOfRow.Length]).ToArray();
        for (var row = 0; row < cellOfRow.Length; row++)
        {
            var rest = cellOfRow[row];
            for (var f = levelCounts.Length - 1; f >= 0; f--)
            {
                codes[f][row] = rest % levelCounts[f];
                rest /= levelCounts[f];
            }
        }

        return codes;
    }

    private static void Shuffle(int[] items, Random random)
    {
        for (var i = items.Length - 1; i > 0; i--)
        {
            var j = random.Next(i + 1);
            (items[i], items[j]) = (items[j], items[i]);
        }
    }
}
