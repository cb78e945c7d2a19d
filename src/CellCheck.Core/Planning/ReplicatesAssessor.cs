using CellCheck.Core.Analysis;
using CellCheck.Core.Cells;
using CellCheck.Core.Residuals;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Planning;

/// <summary>Judges a response's replication and simulates what its single checks could have seen.</summary>
public static class ReplicatesAssessor
{
    /// <summary>Offset of the sensitivity simulation's seed from the calibration seed, so the two use different data sets.</summary>
    public const int SeedOffset = 100;

    public static ReplicatesResult Assess(Census census, ResidualSet residuals, AnalysisOptions options)
    {
        ArgumentNullException.ThrowIfNull(census);
        ArgumentNullException.ThrowIfNull(residuals);
        ArgumentNullException.ThrowIfNull(options);
        var verdict = CensusRule.Judge(census, residuals.ResidualDf);
        var plan = residuals.NullPlan;
        var seed = options.Simulation.Seed + SeedOffset;
        SensitivityTable table;
        if (residuals.ResidualDf <= 0 || plan.UsableResiduals == 0)
        {
            var rows = SensitivityChecks.All.Select(c => new SensitivityRow(c.Check, c.Scope, c.Departure, null, null, NotTestableReason.NoResidualDegreesOfFreedom));
            table = new SensitivityTable(options.Alpha, options.Adjust, 0, seed, rows.ToArray(), "no residual degrees of freedom: the checks cannot run");
        }
        else if (plan.Rows > options.Simulation.MonteCarloLimit)
        {
            table = new SensitivityTable(options.Alpha, options.Adjust, 0, seed, [],
                $"not simulated above {options.Simulation.MonteCarloLimit} rows (too slow for a default run)");
        }
        else
        {
            table = CheckSensitivity.Simulate(plan, options.Alpha, options.Adjust, options.SensitivityDraws, seed);
        }

        return new ReplicatesResult(verdict, residuals.ResidualDf, table, SensitivityWords.Summarize(verdict, census, residuals.ResidualDf, table));
    }
}
