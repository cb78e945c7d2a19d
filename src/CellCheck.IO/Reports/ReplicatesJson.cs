using System.Text.Json;
using CellCheck.Core.Calibration;
using CellCheck.Core.Planning;

namespace CellCheck.IO.Reports;

/// <summary>Writes the replicates block of a response: census verdict, its rule, and the sensitivity of every single check.</summary>
internal static class ReplicatesJson
{
    public static void Write(Utf8JsonWriter w, ReplicatesResult? r)
    {
        if (r is null)
        {
            w.WriteNull("replicates");
            return;
        }

        w.WriteStartObject("replicates");
        w.WriteString("verdict", SensitivityWords.Word(r.Census.Level));
        w.WriteString("rule", r.Census.Rule);
        JsonReportWriter.Strings(w, "reasons", r.Census.Reasons);
        w.WriteNumber("residual_df", r.ResidualDf);
        var t = r.Sensitivity;
        w.WriteStartObject("sensitivity_method");
        w.WriteNumber("alpha", t.Alpha);
        w.WriteString("adjust", CheckRun.AdjustName(t.Adjust));
        w.WriteString("p", "asymptotic, as in the supporting tables");
        w.WriteNumber("draws", t.Draws);
        w.WriteNumber("seed", t.Seed);
        Optional(w, "note", t.Note);
        w.WriteEndObject();
        w.WriteStartArray("sensitivity");
        foreach (var row in t.Rows)
        {
            w.WriteStartObject();
            w.WriteString("check", row.Check);
            w.WriteString("scope", row.Scope);
            w.WriteString("departure", DepartureName(row.Departure));
            w.WriteString("departure_text", SensitivityChecks.Describe(row.Departure));
            Rate(w, "catches", row.Catches);
            Rate(w, "false_alarm", row.FalseAlarm);
            Optional(w, "reason", row.Reason);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        JsonReportWriter.Strings(w, "summary", r.Summary);
        w.WriteEndObject();
    }

    internal static string DepartureName(Departure d) => d switch
    {
        Departure.Lognormal => "lognormal-cell",
        Departure.VarianceRatio4 => "variance-ratio-4",
        Departure.HeavyTails => "heavy-tails",
        _ => "none",
    };

    internal static void Rate(Utf8JsonWriter w, string name, RateEstimate? r)
    {
        if (r is null)
        {
            w.WriteNull(name);
            return;
        }

        w.WriteStartObject(name);
        w.WriteNumber("rate", r.Rate);
        w.WriteNumber("lower_95", r.Lower);
        w.WriteNumber("upper_95", r.Upper);
        w.WriteNumber("draws", r.Draws);
        w.WriteEndObject();
    }

    internal static void Optional(Utf8JsonWriter w, string name, string? value)
    {
        if (value is null)
        {
            w.WriteNull(name);
        }
        else
        {
            w.WriteString(name, value);
        }
    }
}
