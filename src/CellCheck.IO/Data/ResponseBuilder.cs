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
internal sealed class ResponseBuilder(string name, string? unit, int capacity, MissingTokens missing, NumberSyntax syntax)
{
    private readonly List<double> _values = new(capacity);
    private readonly List<ExcludedRow> _excluded = [];
    private decimal? _origin;
    private int? _decimals;
    private bool _exponentSeen;

    /// <summary>The first value that seems to use an undeclared thousands separator (line and text), if any.</summary>
    public (int Line, string Text)? Grouping { get; private set; }

    public void Add(ReadOnlySpan<char> raw, int line)
    {
        if (missing.IsMissing(raw))
        {
            Exclude(line, "missing", "missing value");
            return;
        }

        Span<char> buffer = stackalloc char[Math.Min(raw.Length, 256)];
        if (!syntax.TryNormalize(raw, buffer, out var length, out var grouping))
        {
            if (grouping)
            {
                Grouping ??= (line, raw.ToString());
            }

            Exclude(line, grouping ? "thousands-separator" : "not-a-number", (grouping ? "thousands separator in " : "not a number: ") + $"'{Clip(raw)}'");
            return;
        }

        var text = buffer[..length];

        if (text.IndexOfAny('e', 'E') < 0 && decimal.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var exact))
        {
            _origin ??= exact;
            _values.Add((double)(exact - _origin.Value));
            _decimals = Math.Max(_decimals ?? 0, exact.Scale);
            return;
        }

        if (double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var value))
        {
            _exponentSeen = true;
            if (!double.IsFinite(value))
            {
                Exclude(line, "not-finite", $"not a finite number: '{Clip(raw)}'");
                return;
            }

            _origin ??= 0m;
            _values.Add(value - (double)_origin.Value);
            return;
        }

        Exclude(line, NonFinite(text) ? "not-finite" : "not-a-number",
            (NonFinite(text) ? "not a finite number" : "not a number") + $": '{Clip(raw)}'");
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

    public ResponseColumn Build() => new(name, unit, (double)(_origin ?? 0m), [.. _values]) { Decimals = _exponentSeen ? null : _decimals };

    public IReadOnlyList<ExcludedRow> Excluded => _excluded;

    private static string Clip(ReadOnlySpan<char> text) => text.Length <= 40 ? text.ToString() : string.Concat(text[..37], "...");
}
