using System.Globalization;
using System.Text;

namespace CellCheck.DemoData;

/// <summary>
/// Invented assay lab: three analysts × two reagent lots, relative potency (%) of a reference standard, with the
/// unequal replicate counts of a real week (one analyst ran a single assay on lot R2) and one invalidated run
/// recorded as NA. Rows are written in sequence order.
/// </summary>
internal static class AssayLab
{
    public const int Seed = 4711;

    public static string Csv()
    {
        var g = new Gaussian(Seed);
        var counts = new Dictionary<(string, string), int>
        {
            [("ana", "R1")] = 6, [("ana", "R2")] = 5,
            [("ben", "R1")] = 4, [("ben", "R2")] = 6,
            [("chen", "R1")] = 5, [("chen", "R2")] = 1,
        };
        var rows = new List<string>();
        foreach (var ((analyst, lot), n) in counts)
        {
            for (var rep = 0; rep < n; rep++)
            {
                var potency = 100.0 + (analyst == "ben" ? 1.2 : 0.0) - (lot == "R2" ? 0.8 : 0.0) + (g.Next() * 1.5);
                rows.Add(string.Create(CultureInfo.InvariantCulture, $"{analyst},{lot},{potency:F1}"));
            }
        }

        var order = rows.ToArray();
        g.Shuffle(order);
        var sb = new StringBuilder("sequence,analyst,reagent_lot,potency\n");
        for (var i = 0; i < order.Length; i++)
        {
            var row = i == 9 ? order[i][..(order[i].LastIndexOf(',') + 1)] + "NA" : order[i];
            sb.Append(CultureInfo.InvariantCulture, $"{i + 1},{row}\n");
        }

        return sb.ToString();
    }
}
