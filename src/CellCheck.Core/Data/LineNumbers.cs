namespace CellCheck.Core.Data;

/// <summary>
/// The data-file line of every row. Most files have no blank, skipped or filtered lines between the header and the
/// last row, so the lines are consecutive: those are held as their first line and count (no array; ten million rows
/// would otherwise take 40 MB); any other lines as an array.
/// </summary>
public sealed class LineNumbers : IRowValues
{
    private readonly int[]? _lines;
    private readonly int _first;

    private LineNumbers(int[]? lines, int first, int length) => (_lines, _first, Length) = (lines, first, length);

    /// <summary>Number of rows.</summary>
    public int Length { get; }

    /// <summary>True when the lines are consecutive and held without an array.</summary>
    public bool IsConsecutive => _lines is null;

    /// <summary>The line of <paramref name="row"/>.</summary>
    public int this[int row] => _lines is { } lines ? lines[row] : (uint)row < (uint)Length ? _first + row : throw new IndexOutOfRangeException();

    /// <summary><paramref name="count"/> rows on consecutive lines from <paramref name="first"/>.</summary>
    public static LineNumbers Consecutive(int first, int count)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(count);
        return new LineNumbers(null, first, count);
    }

    /// <summary>The given lines (held without the array when they are consecutive).</summary>
    public static LineNumbers From(int[] lines)
    {
        ArgumentNullException.ThrowIfNull(lines);
        for (var i = 1; i < lines.Length; i++)
        {
            if (lines[i] != lines[0] + i)
            {
                return new LineNumbers(lines, 0, lines.Length);
            }
        }

        return new LineNumbers(null, lines.Length > 0 ? lines[0] : 0, lines.Length);
    }

    /// <summary>The lines of <paramref name="rows"/>, as a new array.</summary>
    public int[] Gather(ReadOnlySpan<int> rows) => RowValues.Gather(this, rows);

    /// <summary>Every row's line, as a new array.</summary>
    public int[] ToArray() => RowValues.All(this);
}
