namespace CellCheck.Core.Remedies;

/// <summary>
/// One line of the before-and-after comparison: what is compared (<c>verdict</c>, an assumption name, or the
/// report part a supporting check belongs to: <c>pooled</c>, <c>spread</c>, <c>model</c>), the check, and both sides.
/// </summary>
public sealed record ComparisonRow(string Item, string? Check, ComparisonSide Before, ComparisonSide After);
