namespace CellCheck.Core.Data;

/// <summary>
/// A factor held columnar: each distinct level label once, and one level index per row
/// (<see cref="Missing"/> where the row has no value). Levels keep the order of first appearance.
/// </summary>
public sealed class FactorColumn
{
    /// <summary>Code of a row with no value for this factor.</summary>
    public const int Missing = -1;

    public FactorColumn(string name, IReadOnlyList<string> levels, int[] codes, double[]? levelValues = null)
        : this(name, levels, LevelCodes.From(codes ?? throw new ArgumentNullException(nameof(codes)), levels?.Count ?? 0), levelValues)
    {
    }

    public FactorColumn(string name, IReadOnlyList<string> levels, LevelCodes codes, double[]? levelValues = null)
    {
        ArgumentNullException.ThrowIfNull(name);
        ArgumentNullException.ThrowIfNull(levels);
        ArgumentNullException.ThrowIfNull(codes);
        if (levelValues is not null && levelValues.Length != levels.Count)
        {
            throw new ArgumentException("one value per level is required", nameof(levelValues));
        }

        Name = name;
        Levels = levels;
        Codes = codes;
        LevelValues = levelValues;
    }

    /// <summary>Numeric value of each level when the factor is declared numeric (it then enters a model as a linear term); otherwise null.</summary>
    public double[]? LevelValues { get; }

    /// <summary>True when the factor is declared numeric.</summary>
    public bool IsNumeric => LevelValues is not null;

    /// <summary>Display name of the factor.</summary>
    public string Name { get; }

    /// <summary>Distinct level labels as written in the data file.</summary>
    public IReadOnlyList<string> Levels { get; }

    /// <summary>Level index per row, or <see cref="Missing"/>.</summary>
    public LevelCodes Codes { get; }
}
