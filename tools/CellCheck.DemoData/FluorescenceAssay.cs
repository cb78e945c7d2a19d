using System.Globalization;
using System.Text;

namespace CellCheck.DemoData;

/// <summary>
/// Invented fluorescence assay: four standard concentrations × two plate types, six wells each, read in a randomised
/// order. The reader's error is multiplicative (about 12% of the signal), so the spread of a cell grows in proportion
/// to its mean: the equal-spread check flags the raw signal, and the log removes the flag.
/// </summary>
internal static class FluorescenceAssay
{
    public const int Seed = 3141;

    public static string Csv()
    {
        var g = new Gaussian(Seed);
        var wells = new List<(int Concentration, string Plate)>();
        foreach (var concentration in new[] { 5, 20, 80, 320 })
        {
            foreach (var plate in new[] { "black", "clear" })
            {
                for (var rep = 0; rep < 6; rep++)
                {
                    wells.Add((concentration, plate));
                }
            }
        }

        var order = wells.ToArray();
        g.Shuffle(order);
        var sb = new StringBuilder("read,concentration,plate,signal\n");
        for (var i = 0; i < order.Length; i++)
        {
            var (concentration, plate) = order[i];
            var mean = 12.0 * concentration * (plate == "clear" ? 0.7 : 1.0);
            var signal = mean * Math.Exp(0.12 * g.Next());
            sb.Append(CultureInfo.InvariantCulture, $"{i + 1},{concentration},{plate},{signal:F1}\n");
        }

        return sb.ToString();
    }
}
