using System.Globalization;
using System.Text;

namespace CellCheck.DemoData;

/// <summary>
/// Invented coating-line trial: cure temperature × line speed × primer, six panels per setting, adhesion (MPa)
/// and gloss (GU). One setting (200 °C, fast, primer B) cures unevenly: its adhesion SD is about five times the rest.
/// Rows are written in run order (randomised).
/// </summary>
internal static class CoatingCure
{
    public const int Seed = 20261201;

    public static string Csv()
    {
        var g = new Gaussian(Seed);
        var rows = new List<string>();
        foreach (var temp in new[] { 160, 180, 200 })
        {
            foreach (var speed in new[] { "slow", "fast" })
            {
                foreach (var primer in new[] { "A", "B" })
                {
                    var uneven = temp == 200 && speed == "fast" && primer == "B";
                    for (var rep = 0; rep < 6; rep++)
                    {
                        var adhesion = 6.0 + (0.015 * (temp - 160)) - (speed == "fast" ? 0.4 : 0.0) + (primer == "B" ? 0.3 : 0.0)
                            + (g.Next() * (uneven ? 1.5 : 0.3));
                        var gloss = 82.0 - (0.05 * (temp - 160)) + (speed == "fast" ? 1.5 : 0.0) + (g.Next() * 1.1);
                        rows.Add(string.Create(CultureInfo.InvariantCulture, $"{temp},{speed},{primer},{adhesion:F2},{gloss:F1}"));
                    }
                }
            }
        }

        var order = rows.ToArray();
        g.Shuffle(order);
        var sb = new StringBuilder("run,cure_temp,line_speed,primer,adhesion,gloss\n");
        for (var i = 0; i < order.Length; i++)
        {
            sb.Append(CultureInfo.InvariantCulture, $"{i + 1},{order[i]}\n");
        }

        return sb.ToString();
    }
}
