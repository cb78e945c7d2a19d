using CellCheck.Core.Cells;

namespace CellCheck.Core.Planning;

/// <summary>
/// Judges whether a response's replication lets the assumption checks mean anything, from the census (replicates per
/// cell, empty combinations, singleton cells) and the residual degrees of freedom of the fitted model.
/// </summary>
/// <remarks>
/// Adequate needs at least <see cref="AdequateResidualDf"/> residual degrees of freedom: Mead's (1988) resource
/// equation (The Design of Experiments, Cambridge University Press) asks for at least 10 error degrees of freedom for a
/// usable estimate of the error variance. It also needs at least <see cref="AdequateReplicates"/> values in every cell
/// (common practice, no source: below five, a cell's SD rests on three or fewer degrees of freedom and Shapiro-Wilk
/// within a cell has almost no power), no empty combination and no singleton cell.
/// </remarks>
public static class CensusRule
{
    /// <summary>Residual degrees of freedom needed for adequate (Mead 1988, resource equation).</summary>
    public const int AdequateResidualDf = 10;

    /// <summary>Values per cell needed for adequate (common practice, no source).</summary>
    public const int AdequateReplicates = 5;

    public const string Rule =
        "adequate: every combination observed with at least 5 values (common practice, no source) and at least 10 residual "
        + "degrees of freedom (Mead 1988, resource equation); unreplicated: no cell holds two or more values, or no residual "
        + "degrees of freedom remain; marginal: anything in between";

    public static CensusVerdict Judge(Census census, int residualDf)
    {
        ArgumentNullException.ThrowIfNull(census);
        if (census.MaxReplicates < 2 || residualDf <= 0)
        {
            var why = census.MaxReplicates < 2
                ? "every cell holds a single value: within-cell spread and shape cannot be seen"
                : "no residual degrees of freedom remain after the model";
            return new CensusVerdict(ReplicationLevel.Unreplicated, Rule, [why]);
        }

        var reasons = new List<string>();
        if (census.MinReplicates < AdequateReplicates)
        {
            reasons.Add($"the smallest cell holds {census.MinReplicates} value(s), below {AdequateReplicates}");
        }

        if (census.EmptyCount > 0)
        {
            reasons.Add($"{census.EmptyCount} combination(s) of the factors have no values");
        }

        if (census.Singletons > 0)
        {
            reasons.Add($"{census.Singletons} cell(s) hold a single value and take no part in the residual checks");
        }

        if (residualDf < AdequateResidualDf)
        {
            reasons.Add($"{residualDf} residual degrees of freedom, below {AdequateResidualDf}");
        }

        return new CensusVerdict(reasons.Count == 0 ? ReplicationLevel.Adequate : ReplicationLevel.Marginal, Rule, reasons);
    }
}
