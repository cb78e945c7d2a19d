using CellCheck.Core.Analysis;

namespace CellCheck.Core.Remedies;

/// <summary>
/// Other remedies, given as advice: a Welch-type analysis when spread differs and no power removes it, rank-based
/// methods when normality fails with heavy tails, and the caution that choosing the analysis by pre-tests has error
/// rates of its own.
/// </summary>
public static class RemedyAdvice
{
    /// <summary>Compare means without assuming equal spread.</summary>
    public const string Welch = "Spread differs and no power transformation removes it: compare means without assuming equal spread, "
        + "with Welch's (1951) ANOVA for one factor, or heteroscedasticity-consistent (HC3) standard errors for a factorial model "
        + "(Long & Ervin 2000).";

    /// <summary>The caution that goes with any advice.</summary>
    public const string PreTest = "Choosing the analysis by these pre-tests has error rates of its own: the test chosen no longer has "
        + "its stated size or power (Zimmerman 2004, Br. J. Math. Stat. Psychol. 57, 173-181). Prefer a transformation the "
        + "measurement suggests (counts, rates, concentrations) or one settled on earlier data.";

    /// <summary>Advice for a response from its report, the recommendation and (when applied) the transformed report.</summary>
    public static IReadOnlyList<string> For(ResponseReport before, TransformChoice? recommended, ResponseReport? after)
    {
        ArgumentNullException.ThrowIfNull(before);
        var advice = new List<string>();
        var judged = after ?? before;
        var spreadFlag = Flagged(before, AssumptionNames.EqualSpread);
        var noPower = recommended is null || recommended.IsIdentity || (after is not null && Flagged(after, AssumptionNames.EqualSpread));
        if (spreadFlag && noPower)
        {
            advice.Add(Welch);
        }

        if (Flagged(judged, AssumptionNames.Normality) && HeavyTailed(judged.Pooled))
        {
            advice.Add("The residuals are heavy-tailed (excess kurtosis " + NumberText.Value(judged.Pooled.ExcessKurtosis, 3)
                + "), which a power transformation does little for: rank-based methods do not assume normal errors: the "
                + "Kruskal-Wallis test (Kruskal & Wallis 1952) for one factor, the aligned rank transform (Higgins & Tashtoush 1994) "
                + "for factorial effects.");
        }

        if (advice.Count > 0 || recommended is { IsIdentity: false })
        {
            advice.Add(PreTest);
        }

        return advice;
    }

    /// <summary>Heavy tails: pooled excess kurtosis above twice its standard error under normality, √(24/n)
    /// (the large-sample variance of g₂ is 24/n; Fisher 1930).</summary>
    public static bool HeavyTailed(PooledResult pooled)
    {
        ArgumentNullException.ThrowIfNull(pooled);
        return pooled.N >= 8 && pooled.ExcessKurtosis > 2 * Math.Sqrt(24.0 / pooled.N);
    }

    private static bool Flagged(ResponseReport r, string assumption) =>
        r.Verdict.Assumptions.Any(a => a.Assumption == assumption && a.Status == CheckStatus.Flag);
}
