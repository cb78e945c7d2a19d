using System.Text.Json;
using CellCheck.Core.Analysis;
using CellCheck.Core.Calibration;

namespace CellCheck.IO.Reports;

/// <summary>Writes the verdict block of a response: status, per-assumption decisions, operating characteristics, findings.</summary>
internal static class VerdictJson
{
    public static void Write(Utf8JsonWriter w, Verdict verdict)
    {
        w.WriteStartObject("verdict");
        w.WriteString("status", StatusWords.Of(verdict.Status));
        w.WriteString("family", Verdict.Family);
        w.WriteStartArray("assumptions");
        foreach (var a in verdict.Assumptions)
        {
            w.WriteStartObject();
            w.WriteString("assumption", a.Assumption);
            Optional(w, "check", a.Check);
            JsonReportWriter.Number(w, "statistic", a.Statistic);
            JsonReportWriter.Number(w, "p", a.P);
            JsonReportWriter.Number(w, "p_adjusted", a.PAdjusted);
            w.WriteString("p_method", a.PMethod);
            w.WriteString("status", StatusWords.Of(a.Status));
            Optional(w, "reason", a.Reason);
            w.WriteString("rule", a.Rule);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        WriteOperating(w, verdict.Operating);
        JsonReportWriter.Strings(w, "findings", verdict.Findings);
        w.WriteEndObject();
    }

    private static void WriteOperating(Utf8JsonWriter w, OperatingCharacteristics? o)
    {
        if (o is null)
        {
            w.WriteNull("operating");
            return;
        }

        w.WriteStartObject("operating");
        w.WriteNumber("alpha", o.Alpha);
        Rate(w, "false_alarm", "clean data: normal errors, equal spread", o.FalseAlarm);
        Rate(w, "variance_ratio_4", "one cell (each in turn) with four times the variance", o.VarianceRatio4);
        Rate(w, "lognormal_cell", "one cell (each in turn) with lognormal errors, shape 0.5", o.Lognormal);
        w.WriteEndObject();
    }

    private static void Rate(Utf8JsonWriter w, string name, string scenario, RateEstimate r)
    {
        w.WriteStartObject(name);
        w.WriteString("scenario", scenario);
        w.WriteNumber("rate", r.Rate);
        w.WriteNumber("lower_95", r.Lower);
        w.WriteNumber("upper_95", r.Upper);
        w.WriteNumber("draws", r.Draws);
        w.WriteEndObject();
    }

    private static void Optional(Utf8JsonWriter w, string name, string? value)
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
