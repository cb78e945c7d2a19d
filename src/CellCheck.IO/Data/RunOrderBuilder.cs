using System.Globalization;
using CellCheck.Core.Data;
using CellCheck.Core.Problems;

namespace CellCheck.IO.Data;

/// <summary>
/// Reads the run-order column: numbers, or timestamps (ISO 8601 and other invariant date-time forms, taken as
/// seconds). Missing values become NaN (those rows are left out of the order checks, and the report says so);
/// text that is neither is a located problem. Positions that go up by one a row from a whole number (logged runs
/// numbered 1, 2, 3, …) are counted rather than stored until one does not (<see cref="RunPositions"/>): ten million
/// rows then write none of the 80 MB their column would take.
/// </summary>
/// <param name="values">Where the values go (a buffer in reserved space), or null for a buffer of its own.</param>
internal sealed class RunOrderBuilder(string column, string path, MissingTokens missing, NumberSyntax syntax, ColumnBuffer<double>? values = null)
{
    private readonly ColumnBuffer<double> _values = values ?? new();
    private bool _counting = true; // every position so far follows the first by one a row, and none is stored
    private double _first;
    private int _count;

    public Problem? Problem { get; private set; }

    public void Add(ReadOnlySpan<char> text, int line)
    {
        if (missing.IsMissing(text))
        {
            Store(double.NaN);
            return;
        }

        if (syntax.Decimal == '.' && syntax.Thousands is null && PlainDecimal.TryParse(text, out var mantissa, out var scale) && PlainDecimal.ToDouble(mantissa, scale) is { } plain)
        {
            // a plain numeral: integer mantissa over an exact power of ten, rounded once (what double parsing gives)
            Store(plain);
            return;
        }

        if (syntax.ParseDouble(text) is var number && ResponseBuilder.InRange(number))
        {
            Store(number);
            return;
        }

        if (DateTimeOffset.TryParse(text, CultureInfo.InvariantCulture, DateTimeStyles.AssumeUniversal, out var time))
        {
            Store(time.UtcTicks / (double)TimeSpan.TicksPerSecond);
            return;
        }

        Store(double.NaN);
        Problem ??= new Problem(ProblemCodes.BadRunOrder, path, line, null,
            $"The run-order column '{column}' holds '{(text.Length > 40 ? string.Concat(text[..37], "...") : text.ToString())}', which is neither a number (of magnitude up to 1e100) nor a date and time.",
            "Write run positions as numbers (1, 2, 3, ...) or times as 2026-03-01T08:30:00.") { ColumnName = column };
    }

    /// <summary>Takes over the rows of <paramref name="next"/>, which read the rows after this builder's.</summary>
    public void Append(RunOrderBuilder next)
    {
        Problem ??= next.Problem;
        if (_counting && next._counting && (next._count == 0 || _count == 0 || RunPositions.Follows(_first, _count, next._first)))
        {
            (_first, _count) = _count == 0 ? (next._first, next._count) : (_first, _count + next._count);
            return;
        }

        StopCounting();
        next.StopCounting();
        _values.Append(next._values);
    }

    public RunPositions Build() => _counting ? RunPositions.Consecutive(_count == 0 ? 0 : _first, _count) : RunPositions.From(_values.Detach());

    private void Store(double value)
    {
        if (_counting && (_count == 0 ? RunPositions.CanStart(value) : RunPositions.Follows(_first, _count, value)))
        {
            _first = _count == 0 ? value : _first;
            _count++;
            return;
        }

        StopCounting();
        _values.Add(value);
    }

    /// <summary>Writes out the positions counted so far and stores every later one.</summary>
    private void StopCounting()
    {
        for (var i = 0; _counting && i < _count; i++)
        {
            _values.Add(_first + i);
        }

        _counting = false;
    }
}
