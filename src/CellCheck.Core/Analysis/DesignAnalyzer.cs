using CellCheck.Core.Data;
using CellCheck.Core.Models;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Analysis;

/// <summary>
/// Analyses every response of a design. With <c>acrossResponses</c> the within-cell p-values are adjusted
/// over the cells of all responses together (one family), otherwise over the cells of each response.
/// </summary>
public static class DesignAnalyzer
{
    public static IReadOnlyList<ResponseReport> Analyze(DesignData data, AnalysisOptions options, ModelSpec? spec, bool acrossResponses)
    {
        ArgumentNullException.ThrowIfNull(data);
        ArgumentNullException.ThrowIfNull(options);
        var single = Enumerable.Range(0, data.Responses.Count).Select(r => ResponseAnalyzer.Analyze(data, r, options, spec)).ToList();
        if (!acrossResponses || data.Responses.Count < 2)
        {
            return single;
        }

        var joint = new JointCellAdjustment();
        foreach (var check in new[] { CheckNames.ShapiroWilk, CheckNames.AndersonDarling })
        {
            var raw = single.SelectMany(r => r.Cells.Select(c => c.Checks.First(k => k.Check == check).P ?? double.NaN)).ToArray();
            var adjusted = PValueAdjustment.Adjust(raw, options.Adjust);
            var at = 0;
            foreach (var report in single)
            {
                var values = new double?[report.Cells.Count];
                for (var c = 0; c < values.Length; c++, at++)
                {
                    values[c] = double.IsNaN(adjusted[at]) ? null : adjusted[at];
                }

                joint.Set(report.Response, check, values);
            }
        }

        var jointOptions = options with { JointCells = joint };
        return Enumerable.Range(0, data.Responses.Count).Select(r => ResponseAnalyzer.Analyze(data, r, jointOptions, spec)).ToList();
    }
}
