namespace CellCheck.IO.Planning;

/// <summary>
/// The plan command's options as typed: the smallest effect ("0.5" a difference between means in the response's
/// unit, "f=0.25" Cohen's f), the within-cell SD, target power of the F tests and of the checks, alpha (null: the
/// design file's), the responses to plan (empty: all), and simulated data sets per size for the checks.
/// </summary>
public sealed record PlanArguments(
    string? Effect,
    double? Sd = null,
    double Power = 0.8,
    double? CheckPower = null,
    double? Alpha = null,
    IReadOnlyList<string>? Responses = null,
    int Draws = 200);
