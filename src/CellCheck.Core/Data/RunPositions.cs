namespace CellCheck.Core.Data;

/// <summary>
/// The run position (or time in seconds) of every row, NaN where missing, held in the least memory that reads back
/// the same doubles. Logged data usually number their runs 1, 2, 3, … in file order (or name the file order itself as
/// the run order): positions each one more than the one before are held as their first value and count, with no array
/// (ten million rows would otherwise take 80 MB for as long as the data are held). Other whole-number positions (run
/// numbers with gaps, times in whole seconds) are held as 32-bit offsets from the first (40 MB there); any other
/// positions as doubles.
/// </summary>
public sealed class RunPositions
{
    /// <summary>The offset that stands for a missing position.</summary>
    private const int MissingOffset = int.MinValue;

    private readonly double[]? _values;
    private readonly int[]? _offsets;
    private readonly int _start; // of this run of positions in the array it reads
    private readonly double _first;

    private RunPositions(double[]? values, int[]? offsets, int start, double first, int length) =>
        (_values, _offsets, _start, _first, Length) = (values, offsets, start, first, length);

    /// <summary>Number of rows.</summary>
    public int Length { get; }

    /// <summary>True when each position is one more than the one before, held without an array.</summary>
    public bool IsConsecutive => _values is null && _offsets is null;

    /// <summary>True when the positions are whole numbers held as offsets from the first (4 bytes a row).</summary>
    public bool IsWhole => _offsets is not null;

    /// <summary>The position of <paramref name="row"/>.</summary>
    public double this[int row]
    {
        get
        {
            if ((uint)row >= (uint)Length)
            {
                throw new IndexOutOfRangeException();
            }

            if (_values is { } values)
            {
                return values[_start + row];
            }

            return _offsets is { } offsets ? Offset(offsets[_start + row]) : _first + row;
        }
    }

    /// <summary>The positions as a span over the array of doubles they are held in; empty when they are held otherwise
    /// (<see cref="IsConsecutive"/> or <see cref="IsWhole"/>).</summary>
    public ReadOnlySpan<double> Held => _values is { } values ? values.AsSpan(_start, Length) : default;

    /// <summary>The offsets from <see cref="First"/> when <see cref="IsWhole"/> (int.MinValue where missing); empty otherwise.</summary>
    internal ReadOnlySpan<int> Offsets => _offsets is { } offsets ? offsets.AsSpan(_start, Length) : default;

    /// <summary>The position that offsets and the consecutive count start from.</summary>
    internal double First => _first;

    /// <summary><paramref name="count"/> positions from <paramref name="first"/>, each one more than the one before.</summary>
    public static RunPositions Consecutive(double first, int count)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(count);
        if (!CanStart(first))
        {
            throw new ArgumentOutOfRangeException(nameof(first), first, "a consecutive run starts at a whole number of magnitude up to 4e15");
        }

        return new RunPositions(null, null, 0, first, count);
    }

    /// <summary>The given positions, held as compactly as they allow (see the class summary); the array is kept only
    /// when no compact form reads back the same doubles.</summary>
    public static RunPositions From(double[] values)
    {
        ArgumentNullException.ThrowIfNull(values);
        var at = Array.FindIndex(values, v => !double.IsNaN(v));
        if (at < 0 || !CanStart(values[at]))
        {
            return new RunPositions(values, null, 0, 0, values.Length);
        }

        var first = values[at];
        var consecutive = at == 0;
        for (var i = 1; i < values.Length && consecutive; i++)
        {
            consecutive = Follows(first, i, values[i]);
        }

        if (consecutive)
        {
            return new RunPositions(null, null, 0, first, values.Length);
        }

        var offsets = new int[values.Length];
        for (var i = 0; i < values.Length; i++)
        {
            if (double.IsNaN(values[i]))
            {
                offsets[i] = MissingOffset;
                continue;
            }

            var offset = values[i] - first;
            if (!(Math.Abs(offset) < int.MaxValue) || offset != Math.Floor(offset) || !Follows(first, (int)offset, values[i]))
            {
                return new RunPositions(values, null, 0, 0, values.Length);
            }

            offsets[i] = (int)offset;
        }

        return new RunPositions(null, offsets, 0, first, values.Length);
    }

    /// <summary>The given positions held as they are, for a short-lived copy (no pass to find a compact form).</summary>
    internal static RunPositions Wrap(double[] values) => new(values, null, 0, 0, values.Length);

    /// <summary>True when a run of positions may be counted from <paramref name="first"/>: a whole number (not −0)
    /// small enough that every sum of it and a 32-bit whole number is exact, so that a position reads back the same
    /// double however it is reached.</summary>
    public static bool CanStart(double first) =>
        first == Math.Floor(first) && Math.Abs(first) <= 4e15 && BitConverter.DoubleToInt64Bits(first + 0.0) == BitConverter.DoubleToInt64Bits(first);

    /// <summary>True when <paramref name="value"/> is, bit for bit, <paramref name="first"/> (which
    /// <see cref="CanStart"/>) plus <paramref name="count"/>.</summary>
    public static bool Follows(double first, int count, double value) =>
        BitConverter.DoubleToInt64Bits(value) == BitConverter.DoubleToInt64Bits(first + count);

    /// <summary>The <paramref name="length"/> positions from <paramref name="start"/> (no copy).</summary>
    public RunPositions Slice(int start, int length)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(start);
        ArgumentOutOfRangeException.ThrowIfNegative(length);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(start, Length - length);
        return IsConsecutive
            ? new RunPositions(null, null, 0, _first + start, length)
            : new RunPositions(_values, _offsets, _start + start, _first, length);
    }

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
        var result = GC.AllocateUninitializedArray<double>(Length);
        for (var i = 0; i < result.Length; i++)
        {
            result[i] = this[i];
        }

        return result;
    }

    private double Offset(int offset) => offset == MissingOffset ? double.NaN : _first + offset;
}
