using System.Text;
using CellCheck.Core.Analysis;
using CellCheck.IO.Reports;

namespace CellCheck.IO.Html;

/// <summary>The verdict panel of one response: which assumption is in doubt, where, how strongly, what to do next.</summary>
internal static class HtmlVerdictPanel
{
    public static void Write(StringBuilder sb, ResponseReport r)
    {
        var status = StatusWords.Of(r.Verdict.Status);
        var head = r.Verdict.Status switch
        {
            CheckStatus.Flag => "In doubt: " + string.Join(", ", r.Verdict.Assumptions.Where(a => a.Status == CheckStatus.Flag).Select(a => a.Assumption)),
            CheckStatus.Pass => "No assumption flagged",
            _ => "Could not be judged",
        };
        sb.Append("<section class=\"verdict ").Append(status).Append("\"><p class=\"head\">").Append(Html.StatusMarkup(status)).Append(' ')
            .Append(Html.Text(r.Response + (r.Unit is null ? string.Empty : " (" + r.Unit + ")") + ": " + head)).Append("</p><ul>");
        foreach (var finding in r.Verdict.Findings)
        {
            sb.Append("<li>").Append(Html.Text(finding)).Append("</li>");
        }

        sb.Append("</ul></section>\n");
    }
}
