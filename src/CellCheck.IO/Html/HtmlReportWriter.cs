using System.Globalization;
using System.Text;
using CellCheck.Core.Analysis;

namespace CellCheck.IO.Html;

/// <summary>
/// Writes the report as one self-contained HTML page: styles inline, pictures as inline SVG, no scripts, no network
/// requests (a Content-Security-Policy forbids both), every text from the user's files HTML-encoded.
/// </summary>
public static class HtmlReportWriter
{
    public const string Policy = "default-src 'none'; style-src 'unsafe-inline'; img-src data:; script-src 'none'; base-uri 'none'; form-action 'none'";

    public static string Render(CheckReport report, HtmlContext context)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(context);
        var d = report.Design;
        var sb = new StringBuilder();
        sb.Append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">\n");
        sb.Append("<meta http-equiv=\"Content-Security-Policy\" content=\"").Append(Policy).Append("\">\n");
        sb.Append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n");
        sb.Append("<title>").Append(Html.Text("CellCheck report: " + (d.Name ?? d.DesignFile))).Append("</title>\n<style>").Append(HtmlStyle.Css).Append("</style></head><body>\n");
        sb.Append("<header class=\"top\"><h1>").Append(Html.Text("Assumption check: " + (d.Name ?? Path.GetFileNameWithoutExtension(d.DesignFile)))).Append("</h1><dl class=\"meta\">");
        Meta(sb, "Design file", d.DesignFile);
        Meta(sb, "Data file", d.DataFile);
        Meta(sb, "Data SHA-256", context.DataSha256);
        Meta(sb, "Generated", context.Generated.ToString("yyyy-MM-dd HH:mm 'UTC'", CultureInfo.InvariantCulture));
        Meta(sb, "Tool", "cellcheck " + context.ToolVersion);
        Meta(sb, "Factors", string.Join(", ", d.Factors) + (d.Blocks.Count > 0 ? "; blocks: " + string.Join(", ", d.Blocks) : string.Empty));
        Meta(sb, "Alpha", NumberText.Value(d.Alpha));
        Meta(sb, "Within-cell adjustment", d.Adjust + " across " + d.AdjustAcross);
        if (d.FilteredOut > 0)
        {
            Meta(sb, "Rows filtered out", NumberText.Count(d.FilteredOut));
        }

        sb.Append("</dl></header>\n");
        foreach (var r in report.Responses)
        {
            HtmlVerdictPanel.Write(sb, r);
        }

        foreach (var r in report.Responses)
        {
            HtmlResponseSection.Write(sb, r, d, context.Pictures.GetValueOrDefault(r.Response) ?? []);
        }

        HtmlMethods.Write(sb);
        sb.Append("<section class=\"caution\"><h2>Caution</h2><p>").Append(Html.Text(CheckReport.Caution)).Append("</p></section>\n");
        sb.Append("</body></html>\n");
        return sb.ToString();
    }

    private static void Meta(StringBuilder sb, string key, string value) =>
        sb.Append("<dt>").Append(Html.Text(key)).Append("</dt><dd>").Append(Html.Text(value)).Append("</dd>");
}
