using System.Text.Json;
using CellCheck.Core.Analysis;

namespace CellCheck.IO.Reports;

/// <summary>Writes one response block of the JSON report.</summary>
internal static class ResponseJson
{
    public static void Write(Utf8JsonWriter w, ResponseReport r, IReadOnlyList<string> factors)
    {
        w.WriteStartObject();
        w.WriteString("response", r.Response);
        if (r.Unit is null)
        {
            w.WriteNull("unit");
        }
        else
        {
            w.WriteString("unit", r.Unit);
        }

        w.WriteStartObject("rows");
        w.WriteNumber("used", r.RowsUsed);
        w.WriteStartArray("excluded");
        foreach (var x in r.Excluded)
        {
            w.WriteStartObject();
            w.WriteNumber("line", x.Line);
            w.WriteString("code", x.Code);
            w.WriteString("reason", x.Reason);
            w.WriteEndObject();
            JsonReportWriter.FlushLarge(w);
        }

        w.WriteEndArray();
        w.WriteEndObject();
        WriteCensus(w, r, factors);
        ReplicatesJson.Write(w, r.Replicates);
        w.WriteStartArray("cells");
        foreach (var cell in r.Cells)
        {
            w.WriteStartObject();
            Levels(w, "levels", cell.Levels, factors);
            w.WriteNumber("n", cell.N);
            JsonReportWriter.Number(w, "mean", cell.Mean);
            JsonReportWriter.Number(w, "sd", cell.Sd);
            JsonReportWriter.Number(w, "skewness", cell.Skewness);
            JsonReportWriter.Number(w, "excess_kurtosis", cell.ExcessKurtosis);
            w.WriteString("status", StatusWords.Of(cell.Status));
            Checks(w, cell.Checks);
            w.WriteEndObject();
            JsonReportWriter.FlushLarge(w);
        }

        w.WriteEndArray();
        if (r.Resolution is { } res)
        {
            w.WriteStartObject("resolution");
            JsonReportWriter.Number(w, "step", res.Step);
            JsonReportWriter.Number(w, "tied_share", res.TiedShare);
            JsonReportWriter.Number(w, "step_to_sd", res.StepToSd);
            w.WriteBoolean("coarse", res.Coarse);
            w.WriteEndObject();
        }

        ModelJson.Write(w, r.Model);
        OrderJson.Write(w, r.Order);
        WritePooled(w, r.Pooled);
        WriteSpread(w, r, factors);
        VerdictJson.Write(w, r.Verdict);
        RemedyJson.Write(w, r, factors);
        w.WriteEndObject();
    }

    private static void WriteCensus(Utf8JsonWriter w, ResponseReport r, IReadOnlyList<string> factors)
    {
        var c = r.Census;
        w.WriteStartObject("census");
        w.WriteNumber("cells", c.Cells);
        w.WriteNumber("combinations", c.Combinations);
        w.WriteStartArray("empty");
        foreach (var levels in c.Empty)
        {
            w.WriteStartObject();
            LevelPairs(w, levels, factors);
            w.WriteEndObject();
            JsonReportWriter.FlushLarge(w);
        }

        w.WriteEndArray();
        w.WriteNumber("empty_count", c.EmptyCount);
        w.WriteNumber("singletons", c.Singletons);
        w.WriteNumber("min_replicates", c.MinReplicates);
        w.WriteNumber("max_replicates", c.MaxReplicates);
        w.WriteBoolean("balanced", c.Balanced);
        w.WriteEndObject();
    }

    private static void WritePooled(Utf8JsonWriter w, PooledResult p)
    {
        w.WriteStartObject("pooled");
        w.WriteString("residuals", p.Residuals);
        w.WriteString("scale", "internally-studentized");
        w.WriteNumber("n", p.N);
        w.WriteNumber("residual_df", p.ResidualDf);
        JsonReportWriter.Number(w, "residual_sd", p.ResidualSd);
        JsonReportWriter.Number(w, "skewness", p.Skewness);
        JsonReportWriter.Number(w, "excess_kurtosis", p.ExcessKurtosis);
        w.WriteString("status", StatusWords.Of(p.Status));
        Checks(w, p.Checks);
        JsonReportWriter.Strings(w, "notes", p.Notes);
        w.WriteEndObject();
    }

    private static void WriteSpread(Utf8JsonWriter w, ResponseReport r, IReadOnlyList<string> factors)
    {
        var s = r.Spread;
        w.WriteStartObject("spread");
        w.WriteNumber("cells_used", s.CellsUsed);
        JsonReportWriter.Number(w, "sd_ratio", s.SdRatio);
        OptionalCell(w, "largest_sd_cell", s.LargestSdCell, r, factors);
        OptionalCell(w, "smallest_sd_cell", s.SmallestSdCell, r, factors);
        w.WriteString("status", StatusWords.Of(s.Status));
        Checks(w, s.Checks);
        JsonReportWriter.Strings(w, "notes", s.Notes);
        w.WriteEndObject();
    }

    private static void OptionalCell(Utf8JsonWriter w, string name, int? cell, ResponseReport r, IReadOnlyList<string> factors)
    {
        if (cell is { } c)
        {
            Levels(w, name, r.Cells[c].Levels, factors);
        }
        else
        {
            w.WriteNull(name);
        }
    }

    internal static void Checks(Utf8JsonWriter w, IReadOnlyList<CheckResult> checks)
    {
        w.WriteStartArray("checks");
        foreach (var k in checks)
        {
            w.WriteStartObject();
            w.WriteString("check", k.Check);
            JsonReportWriter.Number(w, "statistic", k.Statistic);
            if (k.Df is { } df)
            {
                w.WriteStartArray("df");
                foreach (var d in df)
                {
                    w.WriteNumberValue(d);
                }

                w.WriteEndArray();
            }
            else
            {
                w.WriteNull("df");
            }

            JsonReportWriter.Number(w, "p", k.P);
            JsonReportWriter.Number(w, "p_adjusted", k.PAdjusted);
            w.WriteString("status", StatusWords.Of(k.Status));
            if (k.Reason is null)
            {
                w.WriteNull("reason");
            }
            else
            {
                w.WriteString("reason", k.Reason);
            }

            w.WriteEndObject();
        }

        w.WriteEndArray();
    }

    private static void Levels(Utf8JsonWriter w, string name, IReadOnlyList<string> levels, IReadOnlyList<string> factors)
    {
        w.WriteStartObject(name);
        LevelPairs(w, levels, factors);
        w.WriteEndObject();
    }

    private static void LevelPairs(Utf8JsonWriter w, IReadOnlyList<string> levels, IReadOnlyList<string> factors)
    {
        for (var i = 0; i < levels.Count; i++)
        {
            w.WriteString(factors[i], levels[i]);
        }
    }
}
