using CellCheck.Core.Analysis;

namespace CellCheck.Core.Remedies;

/// <summary>
/// Transformation advice for one response and, when one was applied, the same report for the transformed
/// response with a before-and-after comparison.
/// </summary>
/// <param name="BoxCox">λ̂ and interval in the Box-Cox family; null with <paramref name="BoxCoxReason"/> when it cannot be computed.</param>
/// <param name="BoxCoxReason">Why Box-Cox was not computed (<see cref="RemedyReason"/>).</param>
/// <param name="SpreadLevel">The spread-versus-level slope and power.</param>
/// <param name="Recommended">The recommended transformation (power 1: none needed); null when no power could be estimated.</param>
/// <param name="Notes">What was done and why, in words.</param>
/// <param name="Advice">Other remedies, labelled as advice.</param>
public sealed record RemedyResult(
    PowerFit? BoxCox,
    string? BoxCoxReason,
    SpreadLevelResult SpreadLevel,
    TransformChoice? Recommended,
    IReadOnlyList<string> Notes,
    IReadOnlyList<string> Advice)
{
    /// <summary>λ̂ and interval in the Yeo-Johnson family (computed when values are not all positive, or when asked for).</summary>
    public PowerFit? YeoJohnson { get; init; }

    /// <summary>What the user asked for; null when only advice was wanted.</summary>
    public TransformRequest? Requested { get; init; }

    /// <summary>The transformation applied; null when none was.</summary>
    public TransformChoice? Applied { get; init; }

    /// <summary>Why a requested transformation was not applied (<see cref="RemedyReason"/>).</summary>
    public string? NotAppliedReason { get; init; }

    /// <summary>Every check re-run on the transformed response.</summary>
    public ResponseReport? After { get; init; }

    /// <summary>Slope of log SD after the transformation on log mean before it: near 0 when the power stabilised the spread.</summary>
    public double? SpreadLevelSlopeAfter { get; init; }

    /// <summary>Statuses and key p-values before and after.</summary>
    public IReadOnlyList<ComparisonRow> Comparison { get; init; } = [];
}
