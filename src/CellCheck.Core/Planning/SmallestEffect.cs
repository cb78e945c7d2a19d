namespace CellCheck.Core.Planning;

/// <summary>The smallest effect worth detecting: a difference between means (response unit) or Cohen's f.</summary>
public sealed record SmallestEffect(EffectScale Scale, double Value)
{
    public static SmallestEffect Difference(double delta) => new(EffectScale.Difference, delta);

    public static SmallestEffect CohenF(double f) => new(EffectScale.CohenF, f);
}
