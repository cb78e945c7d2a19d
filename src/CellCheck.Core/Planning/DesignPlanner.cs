using CellCheck.Core.Cells;
using CellCheck.Core.Data;
using CellCheck.Core.Models;
using CellCheck.Core.Residuals;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Planning;

/// <summary>
/// Plans the next run of a declared design: the balanced version of its factorial (every combination of the observed
/// levels, the declared model, blocks as complete replicates), the power of every term's F test now and the replicates
/// per cell each needs (<see cref="ReplicatesNeeded"/>), with the within-cell SD from the data's fitted model when not
/// given; and the replicates each single check needs to see its departure (<see cref="SensitivityPlanner"/>).
/// </summary>
public static class DesignPlanner
{
    /// <summary>Reason code when the SD is neither given nor estimable from the data.</summary>
    public const string NoSd = "no-sd";

    public static DesignPlan Plan(DesignData data, ModelSpec spec, PlanRequest request, IReadOnlyList<int> responses, AdjustMethod adjust)
    {
        ArgumentNullException.ThrowIfNull(data);
        ArgumentNullException.ThrowIfNull(spec);
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(responses);
        var factors = data.Factors.Select(f => new PlannedFactor(f.Name, f.Levels.Count, f.LevelValues)).ToArray();
        var design = new PlannedDesign(factors, spec.Terms, data.Blocks.Count > 0);
        var plans = responses.Select(r => PlanResponse(data, spec, design, request, r)).ToArray();
        var checks = SensitivityPlanner.Plan(design.Cells, request.Alpha, adjust, request.CheckPower, request.Draws, request.Seed);
        var configuration = request.Effect.Scale == EffectScale.CohenF ? FactorialPower.CohenFConfiguration : FactorialPower.DifferenceConfiguration;
        return new DesignPlan(design, request, configuration, plans, checks);
    }

    private static ResponsePlan PlanResponse(DesignData data, ModelSpec spec, PlannedDesign design, PlanRequest request, int response)
    {
        var column = data.Responses[response];
        var partition = column.PartitionBy(data.Factors, data.Blocks);
        var census = CensusBuilder.Build(partition);
        var residuals = ResidualSources.For(data, spec, "plan").Compute(partition);
        var current = census.Balanced ? census.MinReplicates : (int)Math.Floor(census.Rows / census.Combinations);
        var fromData = request.Sd is null;
        var sd = request.Sd ?? (residuals.ResidualDf > 0 ? residuals.ResidualSd : double.NaN);
        if (request.Effect.Scale == EffectScale.Difference && !(sd > 0))
        {
            return new ResponsePlan(column.Name, column.Unit, sd, fromData, residuals.ResidualDf, current, census.Balanced, [], NoSd);
        }

        var terms = design.Terms.Select(t => ReplicatesNeeded.Plan(design, t, request.Effect, sd, request.Alpha, request.Power, current)).ToArray();
        return new ResponsePlan(column.Name, column.Unit, sd, fromData, fromData ? residuals.ResidualDf : 0, current, census.Balanced, terms, null);
    }
}
