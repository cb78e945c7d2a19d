using System.Text;
using System.Text.Encodings.Web;

namespace CellCheck.IO.Html;

/// <summary>Small helpers that write encoded HTML: every text from the user's files goes through <see cref="Text"/>.</summary>
internal static class Html
{
    public static string Text(string? value) => HtmlEncoder.Default.Encode(value ?? string.Empty);

    public static void Element(StringBuilder sb, string tag, string text, string? cssClass = null) =>
        sb.Append('<').Append(tag).Append(cssClass is null ? string.Empty : " class=\"" + cssClass + "\"").Append('>').Append(Text(text)).Append("</").Append(tag).Append(">\n");

    public static void Table(StringBuilder sb, IReadOnlyList<string> header, IEnumerable<IReadOnlyList<string>> rows, IReadOnlyList<bool>? numeric = null, string? caption = null)
    {
        sb.Append("<div class=\"table\"><table>");
        if (caption is not null)
        {
            sb.Append("<caption>").Append(Text(caption)).Append("</caption>");
        }

        sb.Append("<thead><tr>");
        for (var i = 0; i < header.Count; i++)
        {
            sb.Append(numeric is not null && numeric[i] ? "<th class=\"num\">" : "<th>").Append(Text(header[i])).Append("</th>");
        }

        sb.Append("</tr></thead><tbody>\n");
        foreach (var row in rows)
        {
            sb.Append("<tr>");
            for (var i = 0; i < row.Count; i++)
            {
                var cell = row[i];
                var status = StatusClass(cell);
                sb.Append("<td").Append(numeric is not null && numeric[i] ? " class=\"num\"" : status is null ? string.Empty : " class=\"" + status + "\"").Append('>')
                    .Append(status is null ? Text(cell) : StatusMarkup(cell)).Append("</td>");
            }

            sb.Append("</tr>\n");
        }

        sb.Append("</tbody></table></div>\n");
    }

    /// <summary>Status shown by word and symbol, not colour alone.</summary>
    public static string StatusMarkup(string status) => status switch
    {
        "pass" => "<span class=\"st pass\">✓ pass</span>",
        "flag" => "<span class=\"st flag\">▲ flag</span>",
        _ => "<span class=\"st nt\">○ " + Text(status) + "</span>",
    };

    private static string? StatusClass(string cell) => cell is "pass" or "flag" || cell.StartsWith("not-testable", StringComparison.Ordinal) || cell.StartsWith("not judged", StringComparison.Ordinal) ? "status" : null;
}
