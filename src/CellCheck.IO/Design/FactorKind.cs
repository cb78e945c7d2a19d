namespace CellCheck.IO.Design;

/// <summary>How a factor's levels are treated: as labels or as numbers.</summary>
public enum FactorKind
{
    Categorical,
    Numeric,
}
