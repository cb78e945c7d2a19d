namespace CellCheck.Core.Models;

/// <summary>One term of a model: the indices of the factors it multiplies (one for a main effect).</summary>
public sealed record ModelTerm(IReadOnlyList<int> Factors)
{
    /// <summary>"a" or "a*b", from the factor names.</summary>
    public string Name(IReadOnlyList<Data.FactorColumn> factors)
    {
        ArgumentNullException.ThrowIfNull(factors);
        return string.Join("*", Factors.Select(f => factors[f].Name));
    }
}
