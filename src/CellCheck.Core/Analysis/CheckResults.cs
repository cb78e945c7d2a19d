using CellCheck.Core.Statistics;

namespace CellCheck.Core.Analysis;

/// <summary>Turns a <see cref="TestOutcome"/> into a reported <see cref="CheckResult"/>.</summary>
public static class CheckResults
{
    /// <summary>
    /// A reported check. The status follows the adjusted p when one is given, else p. A not-testable outcome keeps a
    /// finite statistic (Shapiro-Wilk above n = 5000) and has null p.
    /// </summary>
    public static CheckResult From(string check, TestOutcome outcome, double alpha, double? pAdjusted = null)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        double? statistic = double.IsFinite(outcome.Statistic) ? outcome.Statistic : null;
        IReadOnlyList<double>? df = outcome.Df1 is { } d1 ? (outcome.Df2 is { } d2 ? [d1, d2] : [d1]) : null;
        if (!outcome.IsTestable)
        {
            return new CheckResult(check, statistic, df, null, null, CheckStatus.NotTestable, outcome.Reason);
        }

        var decisive = pAdjusted ?? outcome.P;
        return new CheckResult(check, statistic, df, outcome.P, pAdjusted, StatusRules.FromP(decisive, alpha), null);
    }

    /// <summary>A check that could not run, with its reason code.</summary>
    public static CheckResult NotTestable(string check, string reason) =>
        new(check, null, null, null, null, CheckStatus.NotTestable, reason);
}
