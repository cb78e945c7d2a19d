namespace CellCheck.Core.Analysis;

/// <summary>The full result of a check run: the design summary and one report per response.</summary>
public sealed record CheckReport(DesignSummary Design, IReadOnlyList<ResponseReport> Responses)
{
    /// <summary>Flag when any response flags.</summary>
    public bool AnyFlag => Responses.Any(r => r.Verdict.Status == CheckStatus.Flag);

    /// <summary>The caution every report carries.</summary>
    public const string Caution =
        "These checks support judgement; they do not replace it. A pass means no evidence against an assumption was found "
        + "at the chosen alpha, not that the assumption holds. Where results feed quality or safety decisions, follow the "
        + "applicable standards and have the analysis reviewed by a qualified person.";
}
