namespace CellCheck.Core.Remedies;

/// <summary>
/// What the user asked to re-check: "auto" (the recommended transformation, <see cref="Family"/> null), a stated
/// power in a family, or the Yeo-Johnson family at its estimated λ̂ (<see cref="Power"/> null); and a stated constant
/// added to every value first (never added silently).
/// </summary>
public sealed record TransformRequest(PowerFamily? Family, double? Power, double Shift = 0)
{
    /// <summary>Apply whatever is recommended.</summary>
    public static TransformRequest Auto(double shift = 0) => new(null, null, shift);

    public bool IsAuto => Family is null;
}
