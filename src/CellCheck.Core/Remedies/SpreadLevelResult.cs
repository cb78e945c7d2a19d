namespace CellCheck.Core.Remedies;

/// <summary>
/// The spread-versus-level fit log sᵢ = a + b·log mᵢ over the cells: slope b, the suggested power 1 − b, and the
/// number of cells used; or, when it cannot be computed, a reason (<see cref="RemedyReason"/>) and null numbers.
/// </summary>
public sealed record SpreadLevelResult(double? Slope, double? Intercept, int Cells, string? Reason)
{
    /// <summary>The power that makes the spread constant if s ∝ m^b: 1 − b.</summary>
    public double? Power => Slope is { } b ? 1 - b : null;
}
