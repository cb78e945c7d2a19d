namespace CellCheck.Core.Calibration;

/// <summary>A simulated scenario: clean data, or one stated departure in one cell (each cell in turn across draws).</summary>
public enum Departure
{
    /// <summary>Normal errors, equal spread in every cell.</summary>
    None,

    /// <summary>One cell's variance four times the others' (SD ratio 2).</summary>
    VarianceRatio4,

    /// <summary>One cell's errors lognormal with shape σ = 0.5 (skewness 1.75), standardised to the others' mean and variance.</summary>
    Lognormal,

    /// <summary>Every cell's errors Student t with 5 degrees of freedom (excess kurtosis 6), standardised; spread equal.
    /// Used to measure how often a spread test mistakes heavy tails for unequal spread.</summary>
    HeavyTails,
}
