using System.Text;
using CellCheck.Core.Analysis;
using CellCheck.IO.Reports;

namespace CellCheck.IO.Html;

/// <summary>The model, run-order, per-cell, pooled and spread tables of one response.</summary>
internal static class HtmlDetailSection
{
    public static void Write(StringBuilder sb, ResponseReport r, DesignSummary design)
    {
        var m = r.Model.Info;
        Html.Element(sb, "h3", "Model and outliers");
        Html.Element(sb, "p", $"Model: {m.Name}; rank {m.Rank} of {m.Columns} columns; {m.ResidualDf} residual degrees of freedom."
            + (m.AliasedColumns.Count > 0 ? " Aliased, not estimated: " + string.Join(", ", m.AliasedColumns) + "." : string.Empty));
        Checks(sb, r.Model.Checks, "Model form (beside the verdict)");
        if (r.Model.Outliers.Count > 0)
        {
            Html.Table(sb, ["data-file line", "externally studentized residual", "Bonferroni p"],
                r.Model.Outliers.Select(o => (IReadOnlyList<string>)[NumberText.Count(o.Line), NumberText.Fixed(o.Studentized, 3), NumberText.P(o.PAdjusted)]),
                [true, true, true], "Outlying rows");
        }

        Html.Element(sb, "h3", "Run order");
        if (r.Order.Column is null)
        {
            Html.Element(sb, "p", string.Join(" ", r.Order.Notes), "note");
        }
        else
        {
            Checks(sb, r.Order.Checks, "Order column " + r.Order.Column + ", E[d] " + NumberText.Value(r.Order.ExpectedD ?? double.NaN, 4)
                + ", lag-1 autocorrelation " + NumberText.Fixed(r.Order.Lag1 ?? double.NaN, 3));
            foreach (var note in r.Order.Notes)
            {
                Html.Element(sb, "p", note, "note");
            }
        }

        Html.Element(sb, "h3", "Cells (supporting evidence)");
        var header = design.Factors.Concat(["n", "mean", "sd", "W", "p", "adjusted p", "status"]).ToList();
        var numeric = design.Factors.Select(_ => false).Concat([true, true, true, true, true, true, false]).ToList();
        Html.Table(sb, header, r.Cells.Select(c =>
        {
            var sw = c.Checks[0];
            return (IReadOnlyList<string>)c.Levels.Concat([NumberText.Count(c.N), NumberText.Value(c.Mean), NumberText.Value(c.Sd, 3),
                sw.Statistic is { } w ? NumberText.Fixed(w, 3) : "-", HtmlResponseSection.P(sw.P), HtmlResponseSection.P(sw.PAdjusted),
                c.Status == CheckStatus.NotTestable ? "not-testable: " + sw.Reason : StatusWords.Of(c.Status)]).ToList();
        }), numeric);
        Checks(sb, r.Pooled.Checks, "Pooled studentized residuals (" + r.Pooled.Residuals + ", n = " + NumberText.Count(r.Pooled.N) + ", asymptotic p)");
        Checks(sb, r.Spread.Checks, "Spread across cells (" + NumberText.Count(r.Spread.CellsUsed) + " cells with two or more values, asymptotic p)");
        if (r.Spread.SdRatio is { } ratio)
        {
            Html.Element(sb, "p", "Largest / smallest cell SD: " + NumberText.Fixed(ratio, 2) + ".", "note");
        }
    }

    private static void Checks(StringBuilder sb, IReadOnlyList<CheckResult> checks, string caption) =>
        Html.Table(sb, ["check", "statistic", "df", "p", "status"], checks.Select(k => (IReadOnlyList<string>)[k.Check, HtmlResponseSection.Num(k.Statistic),
            k.Df is { } df ? string.Join(", ", df.Select(x => NumberText.Value(x))) : "-", HtmlResponseSection.P(k.P),
            k.Status == CheckStatus.NotTestable ? "not-testable: " + k.Reason : StatusWords.Of(k.Status)]), [false, true, true, true, false], caption);
}
