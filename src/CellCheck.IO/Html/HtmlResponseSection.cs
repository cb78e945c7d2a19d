using System.Text;
using CellCheck.Core.Analysis;
using CellCheck.IO.Reports;

namespace CellCheck.IO.Html;

/// <summary>The detailed sections of one response.</summary>
internal static class HtmlResponseSection
{
    public static void Write(StringBuilder sb, ResponseReport r, DesignSummary design, IReadOnlyList<(string Title, string Svg)> pictures)
    {
        sb.Append("<h2>").Append(Html.Text("Response " + r.Response + (r.Unit is null ? string.Empty : " (" + r.Unit + ")"))).Append("</h2>\n");
        var c = r.Census;
        Html.Element(sb, "h3", "Census");
        Html.Element(sb, "p", $"{c.Cells} cells of {NumberText.Value(c.Combinations, 12)} combinations; {NumberText.Range(c.MinReplicates, c.MaxReplicates)} values per cell; "
            + $"{(c.Balanced ? "balanced" : "unbalanced")}; {c.EmptyCount} empty combination(s); {c.Singletons} singleton cell(s); "
            + $"{r.RowsUsed} rows used, {r.Excluded.Count} excluded.");
        if (c.Empty.Count > 0)
        {
            Html.Element(sb, "p", "Empty combinations: " + string.Join("; ", c.Empty.Select(e => string.Join(", ", e.Select((l, i) => design.Factors[i] + "=" + l))))
                + (c.EmptyListTruncated ? " (and more)" : string.Empty), "note");
        }

        Html.Element(sb, "h3", "Assumptions");
        Html.Table(sb, ["assumption", "primary check", "statistic", "p", "Holm p", "status", "p from"],
            r.Verdict.Assumptions.Select(a => (IReadOnlyList<string>)[a.Assumption, a.Check ?? "-", Num(a.Statistic), P(a.P), P(a.PAdjusted),
                a.Status == CheckStatus.NotTestable ? "not judged: " + a.Reason : StatusWords.Of(a.Status), a.PMethod]),
            [false, false, true, true, true, false, false]);
        foreach (var a in r.Verdict.Assumptions)
        {
            Html.Element(sb, "p", "Why " + (a.Check ?? "no check") + " for " + a.Assumption + ": " + a.Rule + ".", "note");
        }

        if (r.Verdict.Operating is { } o)
        {
            Html.Element(sb, "p", "For these cell sizes the normality and spread decisions flag clean data " + Pct(o.FalseAlarm.Rate) + " of the time (95% CI "
                + Pct(o.FalseAlarm.Lower) + " to " + Pct(o.FalseAlarm.Upper) + "); they catch a 4:1 variance ratio in one cell " + Pct(o.VarianceRatio4.Rate)
                + " and a lognormal cell " + Pct(o.Lognormal.Rate) + " of the time (" + NumberText.Count(o.FalseAlarm.Draws) + " simulated data sets each).", "note");
        }

        HtmlDetailSection.Write(sb, r, design);
        if (pictures.Count > 0)
        {
            Html.Element(sb, "h3", "Pictures");
            foreach (var (title, svg) in pictures)
            {
                sb.Append("<figure>").Append(svg).Append("<figcaption>").Append(Html.Text(title)).Append("</figcaption></figure>\n");
            }
        }

        Html.Element(sb, "h3", "Excluded rows");
        if (r.Excluded.Count == 0)
        {
            Html.Element(sb, "p", "None.", "note");
        }
        else
        {
            Html.Table(sb, ["line", "reason"], r.Excluded.Select(x => (IReadOnlyList<string>)[NumberText.Count(x.Line), x.Reason]), [true, false]);
        }
    }

    internal static string Num(double? v) => v is { } x ? NumberText.Value(x, 5) : "-";

    internal static string P(double? v) => v is { } x ? NumberText.P(x) : "-";

    private static string Pct(double rate) => NumberText.Fixed(100 * rate, 1) + "%";
}
