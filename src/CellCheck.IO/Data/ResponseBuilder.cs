using System.Globalization;
using CellCheck.Core.Data;

namespace CellCheck.IO.Data;

/// <summary>
/// Builds a response column while reading. Each value is parsed as a decimal and stored as
/// (value − origin) converted to double, where the origin is the column's first value taken exactly: the shift is
/// exact, so values with many constant leading digits (NIST StRD SmLs07-09) lose nothing to binary rounding.
/// Values outside decimal's range fall back to double parsing. Missing and unusable values become NaN with an
/// exclusion that says why.
/// </summary>
internal sealed class ResponseBuilder(string name, string? unit, int capacity)
{
    private readonly List<double> _values = new(capacity);
    private readonly List<ExcludedRow> _excluded = [];
    private decimal? _origin;

    public void Add(ReadOnlySpan<char> text, int line)
    {
        if (MissingTokens.IsMissing(text))
        {
            Exclude(line, "missing", "missing value");
            return;
        }

        if (text.IndexOfAny('e', 'E') < 0 && decimal.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var exact))
        {
            _origin ??= exact;
            _values.Add((double)(exact - _origin.Value));
            return;
        }

        if (double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var value))
        {
            if (!double.IsFinite(value))
            {
                Exclude(line, "not-finite", $"not a finite number: '{Clip(text)}'");
                return;
            }

            _origin ??= 0m;
            _values.Add(value - (double)_origin.Value);
            return;
        }

        Exclude(line, NonFinite(text) ? "not-finite" : "not-a-number",
            (NonFinite(text) ? "not a finite number" : "not a number") + $": '{Clip(text)}'");
    }

    private static bool NonFinite(ReadOnlySpan<char> text)
    {
        var t = text.TrimStart("+-");
        return t.Equals("nan", StringComparison.OrdinalIgnoreCase) || t.Equals("inf", StringComparison.OrdinalIgnoreCase)
            || t.Equals("infinity", StringComparison.OrdinalIgnoreCase);
    }

    /// <summary>Marks a row excluded for a reason found elsewhere (a missing factor value).</summary>
    public void Exclude(int line, string code, string reason)
    {
        _values.Add(double.NaN);
        _excluded.Add(new ExcludedRow(line, code, reason));
    }

    /// <summary>Replaces the last value by an exclusion (used when a later column of the same row excludes it).</summary>
    public void ExcludeLast(int line, string code, string reason)
    {
        if (!double.IsNaN(_values[^1]))
        {
            _values[^1] = double.NaN;
            _excluded.Add(new ExcludedRow(line, code, reason));
        }
    }

    public ResponseColumn Build() => new(name, unit, (double)(_origin ?? 0m), [.. _values]);

    public IReadOnlyList<ExcludedRow> Excluded => _excluded;

    private static string Clip(ReadOnlySpan<char> text) => text.Length <= 40 ? text.ToString() : string.Concat(text[..37], "...");
}
