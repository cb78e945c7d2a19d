namespace CellCheck.Core.Analysis;

/// <summary>How check statuses combine and how a p-value becomes a status.</summary>
public static class StatusRules
{
    /// <summary>Flag when p &lt; alpha (common practice, no source).</summary>
    public static CheckStatus FromP(double p, double alpha) => p < alpha ? CheckStatus.Flag : CheckStatus.Pass;

    /// <summary>Flag if any flags; pass if any passed and none flagged; not-testable if none could run.</summary>
    public static CheckStatus Combine(IEnumerable<CheckResult> checks)
    {
        ArgumentNullException.ThrowIfNull(checks);
        var any = false;
        foreach (var c in checks)
        {
            if (c.Status == CheckStatus.Flag)
            {
                return CheckStatus.Flag;
            }

            any |= c.Status == CheckStatus.Pass;
        }

        return any ? CheckStatus.Pass : CheckStatus.NotTestable;
    }
}
