using System.Text.Encodings.Web;
using System.Text.Json;
using CellCheck.Core.Planning;
using CellCheck.IO.Planning;

namespace CellCheck.IO.Reports;

/// <summary>
/// Writes a plan as JSON (format "cellcheck-plan", version 1; the README documents the keys). Numbers that do not
/// exist are null.
/// </summary>
public static class PlanJsonWriter
{
    public const int FormatVersion = 1;

    public static void Write(PlanRunResult run, Stream stream, string toolVersion)
    {
        ArgumentNullException.ThrowIfNull(run);
        ArgumentNullException.ThrowIfNull(stream);
        using var w = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping });
        var plan = run.Plan;
        var d = plan.Design;
        var q = plan.Request;
        w.WriteStartObject();
        w.WriteString("format", "cellcheck-plan");
        w.WriteNumber("version", FormatVersion);
        w.WriteStartObject("tool");
        w.WriteString("name", "cellcheck");
        w.WriteString("version", toolVersion);
        w.WriteEndObject();
        w.WriteStartObject("design");
        w.WriteString("file", run.Design.Path);
        w.WriteString("data", run.Design.DataText);
        ReplicatesJson.Optional(w, "name", run.Design.Name);
        w.WriteStartArray("factors");
        foreach (var f in d.Factors)
        {
            w.WriteStartObject();
            w.WriteString("name", f.Name);
            w.WriteNumber("levels", f.Levels);
            w.WriteBoolean("numeric", f.IsNumeric);
            w.WriteNumber("df", f.Df);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        w.WriteNumber("cells", d.Cells);
        JsonReportWriter.Strings(w, "terms", d.Terms.Select(d.TermName));
        w.WriteBoolean("replicates_as_blocks", d.Blocked);
        w.WriteEndObject();
        w.WriteStartObject("request");
        w.WriteString("effect_scale", q.Effect.Scale == EffectScale.CohenF ? "cohen-f" : "difference");
        w.WriteNumber("effect", q.Effect.Value);
        JsonReportWriter.Number(w, "sd", q.Sd);
        w.WriteNumber("alpha", q.Alpha);
        w.WriteNumber("power", q.Power);
        w.WriteNumber("check_power", q.CheckPower);
        w.WriteNumber("draws", q.Draws);
        w.WriteNumber("seed", q.Seed);
        w.WriteEndObject();
        w.WriteString("configuration", plan.Configuration);
        w.WriteStartArray("responses");
        foreach (var r in plan.Responses)
        {
            WriteResponse(w, r);
        }

        w.WriteEndArray();
        w.WriteStartArray("checks");
        foreach (var c in plan.Checks)
        {
            w.WriteStartObject();
            w.WriteString("check", c.Check);
            w.WriteString("scope", c.Scope);
            w.WriteString("departure", ReplicatesJson.DepartureName(c.Departure));
            JsonReportWriter.Number(w, "replicates_needed", c.Needed);
            ReplicatesJson.Rate(w, "at_needed", c.Needed is null ? null : c.AtNeeded);
            ReplicatesJson.Rate(w, "below_needed", c.BelowNeeded);
            ReplicatesJson.Rate(w, "at_search_limit", c.Needed is null ? c.AtNeeded : null);
            ReplicatesJson.Optional(w, "reason", c.Reason);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        w.WriteNumber("check_search_limit", SensitivityPlanner.SearchLimit);
        w.WriteString("caution", PlanText.Caution);
        w.WriteEndObject();
        w.Flush();
        stream.WriteByte((byte)'\n');
    }

    private static void WriteResponse(Utf8JsonWriter w, ResponsePlan r)
    {
        w.WriteStartObject();
        w.WriteString("response", r.Response);
        ReplicatesJson.Optional(w, "unit", r.Unit);
        JsonReportWriter.Number(w, "sd", r.Sd);
        w.WriteString("sd_source", r.SdFromData ? "data" : "given");
        w.WriteNumber("sd_df", r.SdDf);
        w.WriteNumber("current_replicates", r.CurrentReplicates);
        w.WriteBoolean("balanced", r.Balanced);
        ReplicatesJson.Optional(w, "reason", r.Reason);
        w.WriteStartArray("terms");
        foreach (var t in r.Terms)
        {
            w.WriteStartObject();
            w.WriteString("term", t.Term);
            w.WriteNumber("df", t.Df1);
            Power(w, "now", t.Current);
            JsonReportWriter.Number(w, "replicates_needed", t.Needed);
            JsonReportWriter.Number(w, "replicates_exact", t.ExactNeeded);
            Power(w, "at_needed", t.AtNeeded);
            Power(w, "below_needed", t.BelowNeeded);
            ReplicatesJson.Optional(w, "reason", t.Reason);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        w.WriteEndObject();
    }

    private static void Power(Utf8JsonWriter w, string name, TermPower? p)
    {
        if (p is null)
        {
            w.WriteNull(name);
            return;
        }

        w.WriteStartObject(name);
        w.WriteNumber("replicates", p.Replicates);
        w.WriteNumber("df_residual", p.Df2);
        w.WriteNumber("lambda", p.Lambda);
        JsonReportWriter.Number(w, "power", p.Power);
        w.WriteEndObject();
    }
}
