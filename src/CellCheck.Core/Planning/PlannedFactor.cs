namespace CellCheck.Core.Planning;

/// <summary>A factor of a planned design: its name, number of levels, and its level values when it enters the model
/// as a linear term (declared numeric), otherwise null.</summary>
public sealed record PlannedFactor(string Name, int Levels, IReadOnlyList<double>? LevelValues = null)
{
    /// <summary>True when the factor enters the model as one linear term.</summary>
    public bool IsNumeric => LevelValues is not null;

    /// <summary>Degrees of freedom of the factor within a term: levels − 1, or 1 for a linear term.</summary>
    public int Df => IsNumeric ? 1 : Levels - 1;
}
