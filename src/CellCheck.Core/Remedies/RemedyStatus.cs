using CellCheck.Core.Analysis;

namespace CellCheck.Core.Remedies;

/// <summary>The status a response is judged by: the transformed response's verdict when a transformation was
/// applied, otherwise its own.</summary>
public static class RemedyStatus
{
    public static CheckStatus Of(ResponseReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        return report.Remedy?.After?.Verdict.Status ?? report.Verdict.Status;
    }
}
