namespace CellCheck.Core.Planning;

/// <summary>How the smallest effect of interest is stated.</summary>
public enum EffectScale
{
    /// <summary>A difference between means in the response's unit (see <see cref="FactorialPower"/> for the configuration).</summary>
    Difference,

    /// <summary>Cohen's (1988) f: the SD of the term's effects across all cells over the within-cell SD.</summary>
    CohenF,
}
