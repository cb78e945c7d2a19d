using System.Globalization;
using CellCheck.Core.Tests.Support;

namespace CellCheck.Core.Tests.Models;

/// <summary>
/// The poisons data (Fixtures/poisons.csv) as a design for time ~ poison + treat with treatment contrasts, the
/// first level of each factor as reference: columns 1, [poison = 2], [poison = 3], ..., [treat = B], [treat = C],
/// [treat = D], in the order R's model.matrix gives them.
/// </summary>
internal sealed class PoisonsDesign
{
    private PoisonsDesign(double[] time, string[] poison, string[] treat)
    {
        Time = time;
        Poison = poison;
        Treat = treat;
    }

    public double[] Time { get; }

    public string[] Poison { get; }

    public string[] Treat { get; }

    public static PoisonsDesign Load()
    {
        var rows = File.ReadAllLines(Fixture.Path("poisons.csv")).Skip(1).Select(l => l.Split(',')).ToArray();
        return new PoisonsDesign(
            rows.Select(r => double.Parse(r[0], NumberStyles.Float, CultureInfo.InvariantCulture)).ToArray(),
            rows.Select(r => r[1]).ToArray(),
            rows.Select(r => r[2]).ToArray());
    }

    /// <summary>Keeps the rows whose 1-based numbers are in <paramref name="rows"/>, in that order.</summary>
    public PoisonsDesign Rows(IEnumerable<int> rows)
    {
        var keep = rows.Select(r => r - 1).ToArray();
        return new PoisonsDesign(keep.Select(i => Time[i]).ToArray(), keep.Select(i => Poison[i]).ToArray(), keep.Select(i => Treat[i]).ToArray());
    }

    /// <summary>Adds one observation at the end.</summary>
    public PoisonsDesign With(double time, string poison, string treat) =>
        new([.. Time, time], [.. Poison, poison], [.. Treat, treat]);

    /// <summary>The treatment-contrast design: intercept, then a 0/1 column for every non-first level of poison
    /// and of treat (levels in ordinal order).</summary>
    public double[,] Design()
    {
        var poisonLevels = Poison.Distinct().Order(StringComparer.Ordinal).Skip(1).ToArray();
        var treatLevels = Treat.Distinct().Order(StringComparer.Ordinal).Skip(1).ToArray();
        var x = new double[Time.Length, 1 + poisonLevels.Length + treatLevels.Length];
        for (var i = 0; i < Time.Length; i++)
        {
            x[i, 0] = 1;
            for (var j = 0; j < poisonLevels.Length; j++)
            {
                x[i, 1 + j] = Poison[i] == poisonLevels[j] ? 1 : 0;
            }

            for (var j = 0; j < treatLevels.Length; j++)
            {
                x[i, 1 + poisonLevels.Length + j] = Treat[i] == treatLevels[j] ? 1 : 0;
            }
        }

        return x;
    }
}
