using System.Text.Encodings.Web;
using System.Text.Json;
using CellCheck.Core.Analysis;

namespace CellCheck.IO.Reports;

/// <summary>
/// Writes a <see cref="CheckReport"/> as JSON (format "cellcheck-report", version 1; the README documents every key).
/// Numbers that do not exist (NaN, a p-value of a test that could not run) are written as null.
/// </summary>
public static class JsonReportWriter
{
    public const int FormatVersion = 1;

    public static void Write(CheckReport report, Stream stream, string toolVersion)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(stream);
        var options = new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };
        using var w = new Utf8JsonWriter(stream, options);
        w.WriteStartObject();
        w.WriteString("format", "cellcheck-report");
        w.WriteNumber("version", FormatVersion);
        w.WriteStartObject("tool");
        w.WriteString("name", "cellcheck");
        w.WriteString("version", toolVersion);
        w.WriteEndObject();
        WriteDesign(w, report.Design);
        w.WriteString("caution", CheckReport.Caution);
        w.WriteString("status", report.AnyFlag ? "flag" : "pass");
        w.WriteStartArray("responses");
        foreach (var response in report.Responses)
        {
            ResponseJson.Write(w, response, report.Design.Factors);
        }

        w.WriteEndArray();
        w.WriteEndObject();
        w.Flush();
        stream.WriteByte((byte)'\n');
    }

    private static void WriteDesign(Utf8JsonWriter w, DesignSummary design)
    {
        w.WriteStartObject("design");
        w.WriteString("file", design.DesignFile);
        w.WriteString("data", design.DataFile);
        if (design.Name is null)
        {
            w.WriteNull("name");
        }
        else
        {
            w.WriteString("name", design.Name);
        }

        Strings(w, "factors", design.Factors);
        Strings(w, "blocks", design.Blocks);
        if (design.RunOrder is null)
        {
            w.WriteNull("run_order");
        }
        else
        {
            w.WriteString("run_order", design.RunOrder);
        }

        w.WriteNumber("alpha", design.Alpha);
        w.WriteString("adjust", design.Adjust);
        w.WriteString("adjust_across", design.AdjustAcross);
        w.WriteNumber("rows_filtered_out", design.FilteredOut);
        w.WriteEndObject();
    }

    /// <summary>Hands what the writer holds to the stream once it passes 64 KB (called between the entries of long
    /// lists): left to itself the writer holds the whole report until the end, a buffer doubled and copied up to the
    /// report's size (10 MB for ten thousand cells). The bytes written are the same.</summary>
    internal static void FlushLarge(Utf8JsonWriter w)
    {
        if (w.BytesPending >= PendingLimit)
        {
            w.Flush();
        }
    }

    private const int PendingLimit = 1 << 16;

    internal static void Number(Utf8JsonWriter w, string name, double? value)
    {
        if (value is { } v && double.IsFinite(v))
        {
            w.WriteNumber(name, v);
        }
        else
        {
            w.WriteNull(name);
        }
    }

    internal static void Strings(Utf8JsonWriter w, string name, IEnumerable<string> values)
    {
        w.WriteStartArray(name);
        foreach (var v in values)
        {
            w.WriteStringValue(v);
        }

        w.WriteEndArray();
    }
}
