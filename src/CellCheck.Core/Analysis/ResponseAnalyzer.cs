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
    /// <summary>Above this many rows the transformation advice's likelihood fits run alongside the checks.</summary>
    public const int EarlyRemedyRows = 100_000;

    /// <summary>Analyses response <paramref name="response"/> of <paramref name="data"/> under <paramref name="spec"/>
    /// (default: the full factorial in the factors, with additive blocks).</summary>
    public static ResponseReport Analyze(DesignData data, int response, AnalysisOptions options, ModelSpec? spec = null)
    {
        ArgumentNullException.ThrowIfNull(data);
        ArgumentNullException.ThrowIfNull(options);
        spec ??= ModelSpec.Full(data.Factors.Count);
        var column = data.Responses[response];
        // on large data: what reading left (its row-wide working arrays) and then what splitting left (the file-order
        // values it took over, each row's cell) is collected before the next step takes fresh memory beside it
        WorkingMemory.Release(data.RowCount);
        var partition = column.PartitionBy(data.Factors, data.Blocks);
        WorkingMemory.Release(data.RowCount);
        var census = CensusBuilder.Build(partition);
        var source = ResidualSources.For(data, spec, ModelName(data, spec));
        var residuals = source.Compute(partition);
        var rows = partition.Values.Count;
        WorkingMemory.Compact(rows);
        // the groups of checks are independent given the residuals: run them side by side (each writes only its own result)
        List<CellResult> cells = null!;
        SpreadResult spread = null!;
        PooledResult pooled = null!;
        ModelResult model = null!;
        OrderResult order = null!;
        ResolutionSummary resolution = null!;
        var calibration = Calibrator.Calibrate(residuals.NullPlan, options.Alpha, options.Simulation);
        (double, double)? primary = null;
        Remedies.RemedyFits? remedyFits = null;
        var early = options.EarlyRemedy && rows > EarlyRemedyRows && residuals.Diagnostics is not null;
        // a finished group hands its working copies back (large data), so the next one reuses their memory
        Action Releasing(Action step) => () =>
        {
            step();
            WorkingMemory.Release(rows);
        };
        var remedyStep = Releasing(() => remedyFits = early ? Remedies.RemedyFits.Compute(data, spec, partition, residuals.Diagnostics!.Model, column, 0, wantsYeoJohnson: false) : null);
        Action primaryStep = () => primary = calibration.MonteCarlo ? PrimaryDecisions.Statistics(partition, residuals, calibration) : null;
        Action cellStep = () => cells = CellChecks.Run(partition, residuals, column.Origin, options, column.Name);
        var spreadStep = Releasing(() => spread = SpreadChecks.Run(partition, residuals, cells, options.Alpha));
        var pooledStep = Releasing(() => pooled = PooledChecks.Run(residuals, options.Alpha));
        var orderStep = Releasing(() => order = OrderChecks.Run(data, partition, residuals, options.Alpha));
        var modelStep = Releasing(() => model = ModelChecks.Run(partition, data.Blocks, spec, residuals, data.SourceLines, options.Alpha));
        Action resolutionStep = () => resolution = RecordingStep.Summarize(partition.Values, column.Decimals, residuals.ResidualSd);
        if (rows > WorkingMemory.ReleaseRows)
        {
            // on large data each group's working copies are tens to hundreds of megabytes: the largest (the order checks)
            // runs beside the smallest, the pooled tests beside the model checks, the transformation fits beside the
            // spread tests, so that no two large copies are held at once
            Parallel.Invoke(orderStep, () =>
            {
                cellStep();
                resolutionStep();
                primaryStep();
            });
            Parallel.Invoke(pooledStep, modelStep);
            Parallel.Invoke(remedyStep, spreadStep);
        }
        else
        {
            Parallel.Invoke(remedyStep, primaryStep, () =>
            {
                cellStep();
                spreadStep();
            }, pooledStep, orderStep, modelStep, resolutionStep);
        }

        // the checks' working copies are garbage now: hand their memory back before the reports are written beside it
        WorkingMemory.Compact(rows);
        var assumptions = PrimaryDecisions.Decide(partition, residuals, pooled, spread, order, calibration, options.Alpha, resolution, options.Simulation, primary);
        var verdict = VerdictWriter.Write(new VerdictInputs(census, cells, pooled, spread, partition.Factors, assumptions, calibration.Operating, model) { Resolution = resolution }, options);
        return new ResponseReport(column.Name, column.Unit, partition.Values.Count, data.Excluded[response], census, cells, pooled, spread, verdict)
        {
            Model = model,
            Order = order,
            Resolution = resolution,
            Replicates = Planning.ReplicatesAssessor.Assess(census, residuals, options),
            Rows = Rows(data, partition, residuals, column.Origin),
            Partition = partition,
            RemedyFits = remedyFits,
        };
    }

    private static string ModelName(DesignData data, ModelSpec spec) =>
        string.Join(" + ", spec.Terms.Select(t => t.Name(data.Factors)).Concat(data.Blocks.Select(b => b.Name)));

    private static RowDiagnostics Rows(DesignData data, CellPartition partition, ResidualSet r, double origin)
    {
        var order = partition.RowOrder;
        var d = r.Diagnostics!;
        return new RowDiagnostics(
            () => data.SourceLines.Gather(order),
            partition.CellOfGroupedIndex,
            () =>
            {
                var fitted = new double[r.Fitted.Length];
                for (var i = 0; i < fitted.Length; i++)
                {
                    fitted[i] = r.Fitted[i] + origin;
                }

                return fitted;
            },
            r.Residuals, () => r.Studentized, () => d.StudentizedExternal, () => d.Leverage, () => d.CooksDistance,
            () => data.RunOrder?.Gather(order),
            () => data.Blocks.Select(b => b.Codes.Gather(order)).ToArray())
        {
            BlockLevels = data.Blocks.Select(b => b.Levels).ToArray(),
        };
    }
}
