using System.Text.Json;
using CellCheck.Core.Analysis;
using CellCheck.Core.Remedies;

namespace CellCheck.IO.Reports;

/// <summary>Writes the <c>remedy</c> block of a response: transformation estimates, the recommendation, and when a
/// transformation was applied the before-and-after comparison and the full report of the transformed response.</summary>
internal static class RemedyJson
{
    public static void Write(Utf8JsonWriter w, ResponseReport r, IReadOnlyList<string> factors)
    {
        if (r.Remedy is not { } m)
        {
            w.WriteNull("remedy");
            return;
        }

        w.WriteStartObject("remedy");
        Fit(w, "box_cox", m.BoxCox);
        Text(w, "box_cox_reason", m.BoxCoxReason);
        Fit(w, "yeo_johnson", m.YeoJohnson);
        w.WriteStartObject("spread_level");
        JsonReportWriter.Number(w, "slope", m.SpreadLevel.Slope);
        JsonReportWriter.Number(w, "power", m.SpreadLevel.Power);
        w.WriteStartArray("power_ci");
        Value(w, m.SpreadLevel.PowerLower);
        Value(w, m.SpreadLevel.PowerUpper);
        w.WriteEndArray();
        JsonReportWriter.Number(w, "slope_se", m.SpreadLevel.SlopeStandardError);
        w.WriteNumber("cells", m.SpreadLevel.Cells);
        Text(w, "reason", m.SpreadLevel.Reason);
        JsonReportWriter.Number(w, "slope_after", m.SpreadLevelSlopeAfter);
        w.WriteEndObject();
        Text(w, "recommended", m.Recommended?.Name);
        JsonReportWriter.Number(w, "recommended_power", m.Recommended?.Power);
        Text(w, "requested", m.Requested is { } q ? Requested(q) : null);
        Text(w, "applied", m.Applied?.Name);
        Text(w, "applied_formula", m.Applied?.Formula(r.Response));
        w.WriteNumber("shift", m.Requested?.Shift ?? 0);
        Text(w, "not_applied_reason", m.NotAppliedReason);
        w.WriteStartArray("comparison");
        foreach (var row in m.Comparison)
        {
            w.WriteStartObject();
            w.WriteString("item", row.Item);
            Text(w, "check", row.Check);
            Side(w, "before", row.Before);
            Side(w, "after", row.After);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        JsonReportWriter.Strings(w, "notes", m.Notes);
        JsonReportWriter.Strings(w, "advice", m.Advice);
        if (m.After is { } after)
        {
            w.WritePropertyName("after");
            ResponseJson.Write(w, after, factors);
        }
        else
        {
            w.WriteNull("after");
        }

        w.WriteEndObject();
    }

    /// <summary>The request as written on the command line.</summary>
    public static string Requested(TransformRequest q) => q switch
    {
        { IsAuto: true } => "auto",
        { Family: PowerFamily.YeoJohnson, Power: null } => "yeo-johnson",
        _ => new TransformChoice(q.Family!.Value, q.Power!.Value).Name,
    };

    private static void Fit(Utf8JsonWriter w, string name, PowerFit? fit)
    {
        if (fit is null)
        {
            w.WriteNull(name);
            return;
        }

        w.WriteStartObject(name);
        w.WriteNumber("lambda", fit.Lambda);
        w.WriteStartArray("ci");
        Value(w, fit.CiLower);
        Value(w, fit.CiUpper);
        w.WriteEndArray();
        w.WriteNumber("level", PowerFit.Level);
        w.WriteString("model", fit.Model);
        w.WriteNumber("n", fit.N);
        w.WriteNumber("residual_df", fit.ResidualDf);
        JsonReportWriter.Number(w, "log_likelihood", fit.LogLikelihood);
        w.WriteStartArray("search");
        w.WriteNumberValue(fit.SearchLower);
        w.WriteNumberValue(fit.SearchUpper);
        w.WriteEndArray();
        w.WriteNumber("shift", fit.Shift);
        w.WriteEndObject();
    }

    private static void Side(Utf8JsonWriter w, string name, ComparisonSide side)
    {
        w.WriteStartObject(name);
        JsonReportWriter.Number(w, "p", side.P);
        JsonReportWriter.Number(w, "p_adjusted", side.PAdjusted);
        w.WriteString("status", StatusWords.Of(side.Status));
        w.WriteEndObject();
    }

    private static void Value(Utf8JsonWriter w, double? v)
    {
        if (v is { } x && double.IsFinite(x))
        {
            w.WriteNumberValue(x);
        }
        else
        {
            w.WriteNullValue();
        }
    }

    private static void Text(Utf8JsonWriter w, string name, string? value)
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
