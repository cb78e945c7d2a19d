using CellCheck.Core.Analysis;

namespace CellCheck.IO.Reports;

/// <summary>The words every report uses for a status.</summary>
public static class StatusWords
{
    public static string Of(CheckStatus status) => status switch
    {
        CheckStatus.Pass => "pass",
        CheckStatus.Flag => "flag",
        _ => "not-testable",
    };
}
