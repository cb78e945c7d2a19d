using System.Globalization;
using CellCheck.Core.Problems;

namespace CellCheck.IO.Data;

/// <summary>
/// Reads the run-order column: numbers, or timestamps (ISO 8601 and other invariant date-time forms, taken as
/// seconds). Missing values become NaN (those rows are left out of the order checks, and the report says so);
/// text that is neither is a located problem.
/// </summary>
/// <param name="values">Where the values go (a buffer in reserved space), or null for a buffer of its own.</param>
internal sealed class RunOrderBuilder(string column, string path, MissingTokens missing, NumberSyntax syntax, ColumnBuffer<double>? values = null)
{
    private readonly ColumnBuffer<double> _values = values ?? new();

    public Problem? Problem { get; private set; }

    public void Add(ReadOnlySpan<char> text, int line)
    {
        if (missing.IsMissing(text))
        {
            _values.Add(double.NaN);
            return;
        }

        if (syntax.Decimal == '.' && syntax.Thousands is null && PlainDecimal.TryParse(text, out var mantissa, out var scale) && PlainDecimal.ToDouble(mantissa, scale) is { } plain)
        {
            // a plain numeral: integer mantissa over an exact power of ten, rounded once (what double parsing gives)
            _values.Add(plain);
            return;
        }

        if (syntax.ParseDouble(text) is var number && ResponseBuilder.InRange(number))
        {
            _values.Add(number);
            return;
        }

        if (DateTimeOffset.TryParse(text, CultureInfo.InvariantCulture, DateTimeStyles.AssumeUniversal, out var time))
        {
            _values.Add(time.UtcTicks / (double)TimeSpan.TicksPerSecond);
            return;
        }

        _values.Add(double.NaN);
        Problem ??= new Problem(ProblemCodes.BadRunOrder, path, line, null,
            $"The run-order column '{column}' holds '{(text.Length > 40 ? string.Concat(text[..37], "...") : text.ToString())}', which is neither a number (of magnitude up to 1e100) nor a date and time.",
            "Write run positions as numbers (1, 2, 3, ...) or times as 2026-03-01T08:30:00.") { ColumnName = column };
    }

    /// <summary>Takes over the rows of <paramref name="next"/>, which read the rows after this builder's.</summary>
    public void Append(RunOrderBuilder next)
    {
        _values.Append(next._values);
        Problem ??= next.Problem;
    }

    public double[] Build() => _values.Detach();
}
