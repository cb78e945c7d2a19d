using CellCheck.Core.Analysis;
using CellCheck.Core.Calibration;

namespace CellCheck.Core.Planning;

/// <summary>The single tests whose sensitivity is simulated, in a fixed order: the normality tests against one lognormal
/// cell, the spread tests against one cell with four times the variance.</summary>
public static class SensitivityChecks
{
    public static IReadOnlyList<SensitivityCheck> All { get; } =
    [
        new(CheckNames.ShapiroWilk, SensitivityScopes.WithinCells, Departure.Lognormal),
        new(CheckNames.AndersonDarling, SensitivityScopes.WithinCells, Departure.Lognormal),
        new(CheckNames.ShapiroWilk, SensitivityScopes.Pooled, Departure.Lognormal),
        new(CheckNames.AndersonDarling, SensitivityScopes.Pooled, Departure.Lognormal),
        new(CheckNames.DagostinoPearson, SensitivityScopes.Pooled, Departure.Lognormal),
        new(CheckNames.Levene, SensitivityScopes.AcrossCells, Departure.VarianceRatio4),
        new(CheckNames.BrownForsythe, SensitivityScopes.AcrossCells, Departure.VarianceRatio4),
        new(CheckNames.BrownForsytheZerosRemoved, SensitivityScopes.AcrossCells, Departure.VarianceRatio4),
        new(CheckNames.Bartlett, SensitivityScopes.AcrossCells, Departure.VarianceRatio4),
        new(CheckNames.FlignerKilleen, SensitivityScopes.AcrossCells, Departure.VarianceRatio4),
    ];

    /// <summary>Words for a departure, for reports.</summary>
    public static string Describe(Departure departure) => departure switch
    {
        Departure.Lognormal => "one cell lognormal, shape 0.5 (skewness 1.75)",
        Departure.VarianceRatio4 => "one cell with 4 times the variance (SD ratio 2)",
        Departure.HeavyTails => "every cell t with 5 df",
        _ => "clean: normal errors, equal spread",
    };
}
