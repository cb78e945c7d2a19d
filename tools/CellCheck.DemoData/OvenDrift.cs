using System.Globalization;
using System.Text;

namespace CellCheck.DemoData;

/// <summary>
/// Invented curing-oven trial: primer × film build, six panels per setting, 24 runs in randomised order over one
/// shift while the oven slowly warms, so cure hardness drifts upward with the run sequence. A second column holds a
/// random relabelling of the run numbers: against it the drift is invisible (the shuffled-order demo).
/// </summary>
internal static class OvenDrift
{
    public const int Seed = 2468;

    public static string Csv()
    {
        var g = new Gaussian(Seed);
        var settings = new List<(string Primer, string Film)>();
        foreach (var primer in new[] { "A", "B" })
        {
            foreach (var film in new[] { "thin", "thick" })
            {
                for (var rep = 0; rep < 6; rep++)
                {
                    settings.Add((primer, film));
                }
            }
        }

        var order = settings.ToArray();
        g.Shuffle(order);
        var shuffled = Enumerable.Range(1, order.Length).ToArray();
        g.Shuffle(shuffled);
        var sb = new StringBuilder("run,shuffled_run,primer,film,hardness\n");
        for (var i = 0; i < order.Length; i++)
        {
            var (primer, film) = order[i];
            var hardness = 72.0 + (primer == "B" ? 1.5 : 0.0) + (film == "thick" ? -2.0 : 0.0) + (0.12 * i) + (g.Next() * 0.4);
            sb.Append(CultureInfo.InvariantCulture, $"{i + 1},{shuffled[i]},{primer},{film},{hardness:F2}\n");
        }

        return sb.ToString();
    }
}
