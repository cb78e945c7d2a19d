namespace CellCheck.Core.Analysis;

/// <summary>Normality checks on the pooled studentized residuals of one response, with their shape.</summary>
public sealed record PooledResult(
    string Residuals,
    int N,
    int ResidualDf,
    double ResidualSd,
    double Skewness,
    double ExcessKurtosis,
    IReadOnlyList<CheckResult> Checks,
    IReadOnlyList<string> Notes)
{
    public CheckStatus Status => StatusRules.Combine(Checks);
}
