namespace CellCheck.Core.Remedies;

/// <summary>
/// Turns an estimated power into a transformation an analyst can read: when λ = 1 is inside the 95% interval no
/// transformation is needed; otherwise the interpretable power (−1 reciprocal, −1/2 reciprocal square root, 0 log,
/// 1/2 square root) nearest to λ̂ inside the interval; when none is inside, λ̂ itself rounded to two decimals. Box &amp;
/// Cox (1964, §4) recommend this use of the interval: a convenient power the data do not reject, rather than λ̂.
/// </summary>
public static class PowerLadder
{
    /// <summary>The interpretable powers, from strongest to weakest.</summary>
    public static IReadOnlyList<double> Powers { get; } = [-1, -0.5, 0, 0.5, 1];

    /// <summary>The transformation recommended by <paramref name="fit"/>; power 1 when none is needed.</summary>
    public static TransformChoice Recommend(PowerFit fit)
    {
        ArgumentNullException.ThrowIfNull(fit);
        if (fit.Contains(1))
        {
            return new TransformChoice(fit.Family, 1, fit.Shift);
        }

        var inside = Powers.Where(fit.Contains).ToList();
        var power = inside.Count > 0
            ? inside.OrderBy(p => Math.Abs(p - fit.Lambda)).First()
            : Math.Round(fit.Lambda, 2, MidpointRounding.AwayFromZero);
        return new TransformChoice(fit.Family, power, fit.Shift);
    }
}
