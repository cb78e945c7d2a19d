using CellCheck.Core.Calibration;
using CellCheck.Core.Cells;
using CellCheck.Core.Data;
using CellCheck.Core.Models;
using CellCheck.Core.Residuals;
using CellCheck.Core.Resolution;

namespace CellCheck.Core.Analysis;

/// <summary>Runs every check for one response: cells, census, model residuals, within-cell, pooled, spread and model checks, verdict.</summary>
public static class ResponseAnalyzer
{
    /// <summary>Analyses response <paramref name="response"/> of <paramref name="data"/> under <paramref name="spec"/>
    /// (default: the full factorial in the factors, with additive blocks).</summary>
    public static ResponseReport Analyze(DesignData data, int response, AnalysisOptions options, ModelSpec? spec = null)
    {
        ArgumentNullException.ThrowIfNull(data);
        ArgumentNullException.ThrowIfNull(options);
        spec ??= ModelSpec.Full(data.Factors.Count);
        var column = data.Responses[response];
        var partition = CellPartition.Build(data.Factors, column.Values, data.Blocks);
        var census = CensusBuilder.Build(partition);
        var source = ResidualSources.For(data, spec, ModelName(data, spec));
        var residuals = source.Compute(partition);
        var cells = CellChecks.Run(partition, residuals, column.Origin, options, column.Name);
        var pooled = PooledChecks.Run(residuals, options.Alpha);
        var spread = SpreadChecks.Run(partition, residuals, cells, options.Alpha);
        var model = ModelChecks.Run(partition, data.Blocks, spec, residuals, data.SourceLines, options.Alpha);
        var calibration = Calibrator.Calibrate(residuals.NullPlan, options.Alpha, options.Simulation);
        var order = OrderChecks.Run(data, partition, residuals, options.Alpha);
        var resolution = RecordingStep.Summarize(partition.Values, column.Decimals, residuals.ResidualSd);
        var assumptions = PrimaryDecisions.Decide(partition, residuals, pooled, spread, order, calibration, options.Alpha, resolution, options.Simulation);
        var verdict = VerdictWriter.Write(new VerdictInputs(census, cells, pooled, spread, partition.Factors, assumptions, calibration.Operating, model) { Resolution = resolution }, options);
        return new ResponseReport(column.Name, column.Unit, partition.Values.Count, data.Excluded[response], census, cells, pooled, spread, verdict)
        {
            Model = model,
            Order = order,
            Resolution = resolution,
            Replicates = Planning.ReplicatesAssessor.Assess(census, residuals, options),
            Rows = Rows(partition, residuals, data.SourceLines, column.Origin) with
            {
                RunOrder = data.RunOrder is { } ro ? partition.RowOrder.Select(r => ro[r]).ToArray() : null,
                BlockCodes = data.Blocks.Select(b => partition.RowOrder.Select(r => b.Codes[r]).ToArray()).ToArray(),
                BlockLevels = data.Blocks.Select(b => b.Levels).ToArray(),
            },
        };
    }

    private static string ModelName(DesignData data, ModelSpec spec) =>
        string.Join(" + ", spec.Terms.Select(t => t.Name(data.Factors)).Concat(data.Blocks.Select(b => b.Name)));

    private static RowDiagnostics Rows(CellPartition partition, ResidualSet r, int[] sourceLines, double origin)
    {
        var n = partition.RowOrder.Length;
        var cells = new int[n];
        for (var c = 0; c < partition.CellCount; c++)
        {
            Array.Fill(cells, c, partition.Values.Starts[c], partition.Size(c));
        }

        var d = r.Diagnostics!;
        return new RowDiagnostics(partition.RowOrder.Select(row => sourceLines[row]).ToArray(), cells, r.Fitted.Select(f => f + origin).ToArray(),
            r.Residuals, r.Studentized, d.StudentizedExternal, d.Leverage, d.CooksDistance);
    }
}
