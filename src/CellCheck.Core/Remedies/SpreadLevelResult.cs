namespace CellCheck.Core.Remedies;

/// <summary>
/// The spread-versus-level fit log sᵢ = a + b·log mᵢ over the cells: slope b with its standard error, the suggested
/// power 1 − b with a 95% interval (t with cells − 2 df: over a narrow range of means the slope is poorly determined
/// and the interval says so), and the number of cells used; or, when it cannot be computed, a reason
/// (<see cref="RemedyReason"/>) and null numbers.
/// </summary>
public sealed record SpreadLevelResult(double? Slope, double? Intercept, int Cells, string? Reason)
{
    /// <summary>Standard error of the slope (least squares, cells − 2 df).</summary>
    public double? SlopeStandardError { get; init; }

    /// <summary>Lower end of the 95% interval of the power.</summary>
    public double? PowerLower { get; init; }

    /// <summary>Upper end of the 95% interval of the power.</summary>
    public double? PowerUpper { get; init; }

    /// <summary>The power that makes the spread constant if s ∝ m^b: 1 − b.</summary>
    public double? Power => Slope is { } b ? 1 - b : null;
}
