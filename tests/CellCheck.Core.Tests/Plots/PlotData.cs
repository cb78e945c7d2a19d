using CellCheck.Core.Analysis;
using CellCheck.Core.Calibration;
using CellCheck.Core.Data;

namespace CellCheck.Core.Tests.Plots;

/// <summary>Small two-factor data sets analysed for the plot-model tests (light calibration: the pictures do not use it).</summary>
internal static class PlotData
{
    public static readonly AnalysisOptions Options = new(0.05, CellCheck.Core.Statistics.AdjustMethod.Holm, new CalibrationSettings(NullDraws: 99, ScenarioDraws: 20));

    /// <summary>Rows as (a, b, y); lines start at 2. Optional blocks and run order per row.</summary>
    public static (DesignSummary Design, ResponseReport Report) Analyze((string A, string B, double Y)[] rows, string[]? blocks = null, double[]? runOrder = null)
    {
        var a = Column("a", rows.Select(r => r.A));
        var b = Column("b", rows.Select(r => r.B));
        var blockColumns = blocks is null ? [] : new[] { Column("block", blocks) };
        var data = new DesignData([a, b], [new ResponseColumn("y", "mm", 0, rows.Select(r => r.Y).ToArray())],
            Enumerable.Range(2, rows.Length).ToArray(), [Array.Empty<ExcludedRow>()], blockColumns)
        {
            RunOrder = runOrder is null ? null : RunPositions.From(runOrder),
            RunOrderColumn = runOrder is null ? null : "run",
        };
        var report = ResponseAnalyzer.Analyze(data, 0, Options);
        var design = new DesignSummary("d.yaml", "d.csv", null, ["a", "b"], runOrder is null ? null : "run", 0.05, "holm")
        {
            Blocks = blocks is null ? [] : ["block"],
        };
        return (design, report);
    }

    private static FactorColumn Column(string name, IEnumerable<string> labels)
    {
        var levels = new List<string>();
        var codes = labels.Select(l =>
        {
            var k = levels.IndexOf(l);
            if (k < 0)
            {
                levels.Add(l);
                k = levels.Count - 1;
            }

            return k;
        }).ToArray();
        return new FactorColumn(name, levels, codes);
    }

    /// <summary>a in {10, 9, 100} (numbers out of order), b in {p, q}: cell sizes 6, 6, 4, 2, 6, 7 with one wild value.</summary>
    public static (string, string, double)[] Mixed()
    {
        var rows = new List<(string, string, double)>();
        void Add(string a, string b, params double[] ys) => rows.AddRange(ys.Select(y => (a, b, y)));
        Add("10", "p", 5.1, 4.8, 5.3, 4.9, 5.0, 5.2);
        Add("10", "q", 6.0, 6.3, 5.8, 6.1, 5.9, 6.2);
        Add("9", "p", 4.0, 4.4, 4.1, 4.3);
        Add("9", "q", 7.1, 7.3);
        Add("100", "p", 8.0, 8.2, 7.9, 8.1, 8.05, 7.95);
        Add("100", "q", 9.0, 9.1, 8.9, 9.05, 8.95, 9.02, 14.0);
        return [.. rows];
    }
}
