using System.Globalization;
using System.Text;

namespace CellCheck.DemoData;

/// <summary>
/// Invented wheat field trial: a randomized complete block design with 4 blocks × 6 treatments (nitrogen rate ×
/// variety), one plot per treatment per block, grain yield in t/ha. Blocks differ in fertility; treatments act
/// additively with block. Rows are written plot by plot in field order.
/// </summary>
internal static class FieldTrial
{
    public const int Seed = 1979;

    public static string Csv()
    {
        var g = new Gaussian(Seed);
        var sb = new StringBuilder("plot,block,nitrogen,variety,yield\n");
        var plot = 1;
        var blockEffect = new[] { 0.4, 0.1, -0.2, -0.3 };
        for (var b = 0; b < 4; b++)
        {
            var treatments = new List<(int N, string V)>();
            foreach (var n in new[] { 0, 60, 120 })
            {
                foreach (var v in new[] { "arden", "bolt" })
                {
                    treatments.Add((n, v));
                }
            }

            var order = treatments.ToArray();
            g.Shuffle(order);
            foreach (var (n, v) in order)
            {
                var yield = 5.2 + blockEffect[b] + (0.012 * n) + (v == "bolt" ? 0.35 : 0.0) + (g.Next() * 0.25);
                sb.Append(CultureInfo.InvariantCulture, $"{plot++},B{b + 1},{n},{v},{yield:F2}\n");
            }
        }

        return sb.ToString();
    }
}
