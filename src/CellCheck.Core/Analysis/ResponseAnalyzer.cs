using CellCheck.Core.Calibration;
using CellCheck.Core.Cells;
using CellCheck.Core.Data;
using CellCheck.Core.Residuals;

namespace CellCheck.Core.Analysis;

/// <summary>Runs every check for one response: cells, census, residuals, within-cell, pooled and spread checks, verdict.</summary>
public static class ResponseAnalyzer
{
    /// <summary>Analyses response <paramref name="response"/> of <paramref name="data"/>, with cell-means residuals unless another source is given.</summary>
    public static ResponseReport Analyze(DesignData data, int response, AnalysisOptions options, IResidualSource? source = null)
    {
        ArgumentNullException.ThrowIfNull(data);
        ArgumentNullException.ThrowIfNull(options);
        source ??= new CellMeansResiduals();
        var column = data.Responses[response];
        var partition = CellPartition.Build(data.Factors, column.Values);
        var census = CensusBuilder.Build(partition);
        var residuals = source.Compute(partition);
        var cells = CellChecks.Run(partition, residuals, column.Origin, options);
        var pooled = PooledChecks.Run(residuals, options.Alpha);
        var spread = SpreadChecks.Run(partition, residuals, cells, options.Alpha);
        var calibration = Calibrator.Calibrate(residuals.NullPlan, options.Alpha, options.Simulation);
        var assumptions = PrimaryDecisions.Decide(partition, residuals, pooled, spread, calibration, options.Alpha);
        var verdict = VerdictWriter.Write(new VerdictInputs(census, cells, pooled, spread, partition.Factors, assumptions, calibration.Operating), options);
        return new ResponseReport(column.Name, column.Unit, partition.Values.Count, data.Excluded[response], census, cells, pooled, spread, verdict);
    }
}
