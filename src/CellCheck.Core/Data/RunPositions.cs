namespace CellCheck.Core.Data;

/// <summary>
/// The run position (or time in seconds) of every row, NaN where missing. Logged data usually number their runs
/// 1, 2, 3, … in file order (or name the file order itself as the run order): such positions, each one more than the
/// one before, are held as their first value and count, with no array (ten million rows would otherwise take 80 MB
/// for as long as the data are held); any other positions as an array. Either way a position reads as the same double.
/// </summary>
public sealed class RunPositions
{
    private readonly double[]? _values;
    private readonly int _offset;
    private readonly double _first;

    private RunPositions(double[]? values, int offset, double first, int length) =>
        (_values, _offset, _first, Length) = (values, offset, first, length);

    /// <summary>Number of rows.</summary>
    public int Length { get; }

    /// <summary>True when each position is one more than the one before, held without an array.</summary>
    public bool IsConsecutive => _values is null;

    /// <summary>The position of <paramref name="row"/>.</summary>
    public double this[int row] => (uint)row < (uint)Length
        ? _values is { } values ? values[_offset + row] : _first + row
        : throw new IndexOutOfRangeException();

    /// <summary><paramref name="count"/> positions from <paramref name="first"/>, each one more than the one before.</summary>
    public static RunPositions Consecutive(double first, int count)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(count);
        if (!CanStart(first))
        {
            throw new ArgumentOutOfRangeException(nameof(first), first, "a consecutive run starts at a whole number of magnitude up to 4e15");
        }

        return new RunPositions(null, 0, first, count);
    }

    /// <summary>The given positions (held without the array when they are consecutive, <see cref="Follows"/>).</summary>
    public static RunPositions From(double[] values)
    {
        ArgumentNullException.ThrowIfNull(values);
        if (values.Length == 0 || !CanStart(values[0]))
        {
            return new RunPositions(values, 0, 0, values.Length);
        }

        for (var i = 1; i < values.Length; i++)
        {
            if (!Follows(values[0], i, values[i]))
            {
                return new RunPositions(values, 0, 0, values.Length);
            }
        }

        return new RunPositions(null, 0, values[0], values.Length);
    }

    /// <summary>True when a consecutive run may start at <paramref name="first"/>: a whole number (not −0) small enough
    /// that every sum of it and a row number is exact, so that a position reads back the same double however it is reached.</summary>
    public static bool CanStart(double first) =>
        first == Math.Floor(first) && Math.Abs(first) <= 4e15 && BitConverter.DoubleToInt64Bits(first + 0.0) == BitConverter.DoubleToInt64Bits(first);

    /// <summary>True when <paramref name="value"/> is, bit for bit, the position <paramref name="count"/> places after
    /// <paramref name="first"/> (which <see cref="CanStart"/>) in a consecutive run.</summary>
    public static bool Follows(double first, int count, double value) =>
        BitConverter.DoubleToInt64Bits(value) == BitConverter.DoubleToInt64Bits(first + count);

    /// <summary>The <paramref name="length"/> positions from <paramref name="start"/> (no copy).</summary>
    public RunPositions Slice(int start, int length)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(start);
        ArgumentOutOfRangeException.ThrowIfNegative(length);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(start, Length - length);
        return new RunPositions(_values, _offset + start, _values is null ? _first + start : 0, length);
    }

    /// <summary>The positions as a span over the array they are held in; empty unless held in one (not <see cref="IsConsecutive"/>).</summary>
    public ReadOnlySpan<double> Held => _values is { } values ? values.AsSpan(_offset, Length) : default;

    /// <summary>The positions of <paramref name="rows"/>, as a new array.</summary>
    public double[] Gather(ReadOnlySpan<int> rows)
    {
        var result = GC.AllocateUninitializedArray<double>(rows.Length);
        for (var k = 0; k < rows.Length; k++)
        {
            result[k] = this[rows[k]];
        }

        return result;
    }

    /// <summary>Every position, as a new array.</summary>
    public double[] ToArray()
    {
        if (_values is { } values)
        {
            return values.AsSpan(_offset, Length).ToArray();
        }

        var result = GC.AllocateUninitializedArray<double>(Length);
        for (var i = 0; i < result.Length; i++)
        {
            result[i] = _first + i;
        }

        return result;
    }
}
