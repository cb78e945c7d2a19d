namespace CellCheck.Core.Analysis;

/// <summary>Findings about the fitted model: aliased terms, its form checks, outlying rows by data-file line, effects.</summary>
internal static class ModelText
{
    private const int RowsNamed = 5;

    public static void Add(ModelResult model, List<string> findings)
    {
        if (model.Info.AliasedTerms.Count > 0 || model.Info.AliasedColumns.Count > 0)
        {
            findings.Add("Aliased in this design (not estimable, fitted without): "
                + string.Join(", ", model.Info.AliasedColumns) + ". The other terms are fitted; compare the model you meant with what the data can estimate.");
        }

        foreach (var c in model.Checks.Where(c => c.Status == CheckStatus.Flag && c.Check != CheckNames.Outliers))
        {
            findings.Add(c.Check == CheckNames.TukeyNonadditivity
                ? "Model form in doubt: Tukey's non-additivity test p " + NumberText.P(c.P ?? double.NaN)
                    + " suggests the effects are not additive (an interaction, or a scale on which they would be: a transformation may help)."
                : "Model form in doubt: lack-of-fit p " + NumberText.P(c.P ?? double.NaN)
                    + " says the declared model misses structure that the replicated settings show; consider more terms.");
        }

        if (model.Outliers.Count > 0)
        {
            var named = string.Join("; ", model.Outliers.Take(RowsNamed).Select(o => "line " + NumberText.Count(o.Line) + " (studentized residual "
                + NumberText.Fixed(o.Studentized, 2) + ", Bonferroni p " + NumberText.P(o.PAdjusted) + ")"));
            findings.Add("Outlying rows (externally studentized residuals, Bonferroni bound over " + NumberText.Count(model.Screened) + " rows): " + named
                + (model.Outliers.Count > RowsNamed ? "; and " + NumberText.Count(model.Outliers.Count - RowsNamed) + " more" : string.Empty)
                + ". Check them for recording errors before anything else.");
        }

        if (model.Effects is { } e)
        {
            var active = Enumerable.Range(0, e.Effects.Length).Where(j => Math.Abs(e.Effects[j]) > e.MarginOfError)
                .Select(j => model.EffectNames[j] + " " + NumberText.Value(e.Effects[j], 3)).ToList();
            findings.Add("Unreplicated two-level factorial: no residual degrees of freedom, so effects are judged on a half-normal plot with Lenth's "
                + "pseudo standard error (PSE " + NumberText.Value(e.PseudoStandardError, 3) + ", margin " + NumberText.Value(e.MarginOfError, 3) + "). "
                + (active.Count == 0 ? "No effect exceeds the margin." : "Effects beyond the margin: " + string.Join(", ", active) + "."));
        }

        findings.AddRange(model.Notes);
    }
}
