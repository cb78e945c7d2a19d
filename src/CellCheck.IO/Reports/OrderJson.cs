using System.Text.Json;
using CellCheck.Core.Analysis;

namespace CellCheck.IO.Reports;

/// <summary>Writes the run-order block of a response.</summary>
internal static class OrderJson
{
    public static void Write(Utf8JsonWriter w, OrderResult o)
    {
        w.WriteStartObject("order");
        if (o.Column is null)
        {
            w.WriteNull("column");
        }
        else
        {
            w.WriteString("column", o.Column);
        }

        w.WriteNumber("rows", o.Rows);
        JsonReportWriter.Number(w, "lag1_autocorrelation", o.Lag1);
        JsonReportWriter.Number(w, "expected_d", o.ExpectedD);
        JsonReportWriter.Number(w, "durbin_watson_p_two_sided", o.DurbinWatsonTwoSided);
        if (o.Method is null)
        {
            w.WriteNull("durbin_watson_method");
        }
        else
        {
            w.WriteString("durbin_watson_method", o.Method);
        }

        ResponseJson.Checks(w, o.Checks);
        w.WriteStartArray("by_block");
        foreach (var b in o.ByBlock)
        {
            w.WriteStartObject();
            w.WriteString("block", b.Block);
            w.WriteNumber("rows", b.Rows);
            JsonReportWriter.Number(w, "d", b.D);
            JsonReportWriter.Number(w, "lag1_autocorrelation", b.Lag1);
            ResponseJson.Checks(w, b.Checks);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        JsonReportWriter.Strings(w, "notes", o.Notes);
        w.WriteEndObject();
    }
}
