using System.Text.Json;
using CellCheck.Core.Analysis;

namespace CellCheck.IO.Reports;

/// <summary>Writes the model block of a response: terms, rank, residual df, aliased columns, form checks, outliers and effects.</summary>
internal static class ModelJson
{
    public static void Write(Utf8JsonWriter w, ModelResult m)
    {
        w.WriteStartObject("model");
        w.WriteString("name", m.Info.Name);
        JsonReportWriter.Strings(w, "terms", m.Info.Terms);
        w.WriteNumber("rank", m.Info.Rank);
        w.WriteNumber("columns", m.Info.Columns);
        w.WriteNumber("df_residual", m.Info.ResidualDf);
        JsonReportWriter.Strings(w, "aliased", m.Info.AliasedColumns);
        JsonReportWriter.Strings(w, "aliased_terms", m.Info.AliasedTerms);
        ResponseJson.Checks(w, m.Checks);
        w.WriteNumber("outliers_screened", m.Screened);
        w.WriteStartArray("outliers");
        foreach (var o in m.Outliers)
        {
            w.WriteStartObject();
            w.WriteNumber("line", o.Line);
            JsonReportWriter.Number(w, "studentized", o.Studentized);
            JsonReportWriter.Number(w, "p_bonferroni", o.PAdjusted);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        if (m.Effects is { } e)
        {
            w.WriteStartObject("effects");
            JsonReportWriter.Number(w, "lenth_pse", e.PseudoStandardError);
            JsonReportWriter.Number(w, "margin_of_error", e.MarginOfError);
            JsonReportWriter.Number(w, "simultaneous_margin", e.SimultaneousMargin);
            w.WriteStartArray("terms");
            for (var j = 0; j < e.Effects.Length; j++)
            {
                w.WriteStartObject();
                w.WriteString("term", m.EffectNames[j]);
                JsonReportWriter.Number(w, "effect", e.Effects[j]);
                JsonReportWriter.Number(w, "half_normal_quantile", e.HalfNormalQuantiles[j]);
                w.WriteBoolean("beyond_margin", Math.Abs(e.Effects[j]) > e.MarginOfError);
                w.WriteEndObject();
            }

            w.WriteEndArray();
            w.WriteEndObject();
        }
        else
        {
            w.WriteNull("effects");
        }

        JsonReportWriter.Strings(w, "notes", m.Notes);
        w.WriteEndObject();
    }
}
