using System.Globalization;
using CellCheck.Core.Data;

namespace CellCheck.IO.Data;

/// <summary>
/// Builds a response column while reading. Each value is parsed as a decimal and stored as
/// (value − origin) converted to double, where the origin is the column's first value taken exactly: the shift is
/// exact, so values with many constant leading digits (NIST StRD SmLs07-09) lose nothing to binary rounding.
/// Values outside decimal's range fall back to double parsing. Missing and unusable values become NaN with an
/// exclusion that says why: <c>missing</c>, <c>not-a-number</c>, <c>not-finite</c> (NaN, Inf), <c>out-of-range</c>
/// (magnitude above 1e100 or, other than 0, below 1e-100) or <c>thousands-separator</c>.
/// </summary>
/// <param name="origin">The origin, when it is known from rows before the first one this builder reads (the rows of a
/// file read in ranges); null to take the first usable value read.</param>
/// <param name="values">Where the values go (a buffer in reserved space), or null for a buffer of its own.</param>
internal sealed class ResponseBuilder(string name, string? unit, MissingTokens missing, NumberSyntax syntax, ResponseOrigin? origin = null,
    ColumnBuffer<double>? values = null)
{
    private readonly ColumnBuffer<double> _values = values ?? new();
    private readonly List<ExcludedRow> _excluded = [];
    private decimal? _origin = origin?.Value;
    private (long Mantissa, int Scale)? _plainOrigin = origin?.Plain;
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

        // the common case first: a plain numeral that normalising would leave as it is, read where it stands
        if (syntax.KeepsPlainNumerals && _plainOrigin is { } origin && PlainDecimal.TryParse(raw, out var m, out var s)
            && PlainDecimal.Difference(m, s, origin.Mantissa, origin.Scale) is { } shifted)
        {
            _values.Add(shifted);
            _decimals = Math.Max(_decimals ?? 0, s);
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
        var plain = PlainDecimal.TryParse(text, out var mantissa, out var scale);
        if (plain && _plainOrigin is { } po && PlainDecimal.Difference(mantissa, scale, po.Mantissa, po.Scale) is { } difference)
        {
            // the exact difference of two scaled integers, rounded once: what the decimal route gives, without decimal
            _values.Add(difference);
            _decimals = Math.Max(_decimals ?? 0, scale);
            return;
        }

        if (text.IndexOfAny('e', 'E') < 0 && decimal.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var exact))
        {
            if (_origin is null)
            {
                _origin = exact;
                _plainOrigin = plain ? (mantissa, scale) : null;
            }

            _values.Add(Offset(exact, _origin.Value));
            _decimals = Math.Max(_decimals ?? 0, exact.Scale);
            return;
        }

        if (double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var value))
        {
            if (double.IsNaN(value) || (double.IsInfinity(value) && NonFinite(text)))
            {
                Exclude(line, "not-finite", $"not a finite number: '{Clip(raw)}'");
                return;
            }

            if (!InRange(value))
            {
                Exclude(line, "out-of-range", $"magnitude outside 1e-100 to 1e100, too extreme to compute with: '{Clip(raw)}'");
                return;
            }

            _exponentSeen = true;
            if (_origin is null)
            {
                _origin = 0m;
                _plainOrigin = (0, 0);
            }

            _values.Add(value - (double)_origin.Value);
            return;
        }

        Exclude(line, NonFinite(text) ? "not-finite" : "not-a-number",
            (NonFinite(text) ? "not a finite number" : "not a number") + $": '{Clip(raw)}'");
    }

    /// <summary>Values of magnitude above this (or below its reciprocal, other than 0) are excluded as out of range: squares
    /// and sums of squares of such values overflow or underflow double precision.</summary>
    public const double MaxMagnitude = 1e100;

    /// <summary>Whether a parsed value can be computed with: finite, and zero or of magnitude within [1/<see cref="MaxMagnitude"/>, <see cref="MaxMagnitude"/>].</summary>
    public static bool InRange(double value) => double.IsFinite(value) && (value == 0 || (Math.Abs(value) <= MaxMagnitude && Math.Abs(value) >= 1 / MaxMagnitude));

    /// <summary>value − origin, exact in decimal; in double when the difference leaves decimal's range (about 7.9e28).</summary>
    private static double Offset(decimal value, decimal origin)
    {
        try
        {
            return (double)(value - origin);
        }
        catch (OverflowException)
        {
            return (double)value - (double)origin;
        }
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
        if (!double.IsNaN(_values.Last))
        {
            _values.Last = double.NaN;
            _excluded.Add(new ExcludedRow(line, code, reason));
        }
    }

    /// <summary>The origin, once a usable value has been read (it never changes afterwards).</summary>
    public ResponseOrigin? Origin => _origin is { } value ? new ResponseOrigin(value, _plainOrigin) : null;

    /// <summary>Takes over the rows of <paramref name="next"/>, which read the rows after this builder's with this
    /// builder's origin (or, when this one has none, its own): the column is then what one builder reading all rows gives.</summary>
    public void Append(ResponseBuilder next)
    {
        _values.Append(next._values);
        _excluded.AddRange(next._excluded);
        if (_origin is null)
        {
            (_origin, _plainOrigin) = (next._origin, next._plainOrigin);
        }

        _decimals = next._decimals is { } d ? Math.Max(_decimals ?? 0, d) : _decimals;
        _exponentSeen |= next._exponentSeen;
        Grouping ??= next.Grouping;
    }

    public ResponseColumn Build() => new(name, unit, (double)(_origin ?? 0m), _values.Detach()) { Decimals = _exponentSeen ? null : _decimals };

    public IReadOnlyList<ExcludedRow> Excluded => _excluded;

    private static string Clip(ReadOnlySpan<char> text) => text.Length <= 40 ? text.ToString() : string.Concat(text[..37], "...");
}
