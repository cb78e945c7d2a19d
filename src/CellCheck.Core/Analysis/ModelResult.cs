using CellCheck.Core.Models;

namespace CellCheck.Core.Analysis;

/// <summary>
/// The fitted model and the checks of its form: Tukey's non-additivity test (additive models), lack of fit (when
/// replicated settings give pure error), the outlier screen, and, for an unreplicated two-level factorial, its effects
/// with Lenth's margins instead of residual tests. These checks inform the verdict's findings; they are not in its
/// family-wise decision.
/// </summary>
public sealed record ModelResult(
    ModelInfo Info,
    IReadOnlyList<CheckResult> Checks,
    IReadOnlyList<OutlierRow> Outliers,
    int Screened,
    LenthResult? Effects,
    IReadOnlyList<string> EffectNames,
    IReadOnlyList<string> Notes);
