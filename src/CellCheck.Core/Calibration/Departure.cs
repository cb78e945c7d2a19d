namespace CellCheck.Core.Calibration;

/// <summary>A simulated scenario: clean data, or one stated departure in one cell of median size.</summary>
public enum Departure
{
    /// <summary>Normal errors, equal spread in every cell.</summary>
    None,

    /// <summary>One cell's variance four times the others' (SD ratio 2).</summary>
    VarianceRatio4,

    /// <summary>One cell's errors lognormal with shape σ = 0.5 (skewness 1.75), standardised to the others' mean and variance.</summary>
    Lognormal,
}
