namespace CellCheck.Core.Planning;

/// <summary>Where a simulated test looks, as written in the reports.</summary>
public static class SensitivityScopes
{
    /// <summary>Each cell on its own, p adjusted across the cells; a flag in any cell counts.</summary>
    public const string WithinCells = "within-cells";

    /// <summary>The pooled internally studentized residuals.</summary>
    public const string Pooled = "pooled";

    /// <summary>Spread compared across the cells with two or more values.</summary>
    public const string AcrossCells = "across-cells";
}
