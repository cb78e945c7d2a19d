using CellCheck.Core.Data;

namespace CellCheck.Core.Analysis;

/// <summary>Names a cell in words: "factor=level, factor=level".</summary>
public static class CellText
{
    public static string Describe(IReadOnlyList<string> levels, IReadOnlyList<FactorColumn> factors)
    {
        ArgumentNullException.ThrowIfNull(levels);
        ArgumentNullException.ThrowIfNull(factors);
        return string.Join(", ", levels.Select((l, i) => factors[i].Name + "=" + l));
    }
}
