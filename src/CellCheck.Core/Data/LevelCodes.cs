using System.Runtime.CompilerServices;

namespace CellCheck.Core.Data;

/// <summary>
/// The level code of every row of a factor column (<see cref="FactorColumn.Missing"/> where the row has none), held
/// in as few bytes a row as the number of levels allows: one below 255 levels, two below 65 535, else four. Codes are
/// stored plus one (zero for a missing level) in the narrow forms. Ten million rows of a factor with a few dozen
/// levels take 10 MB instead of 40.
/// </summary>
public sealed class LevelCodes : IRowValues
{
    private readonly byte[]? _bytes;
    private readonly ushort[]? _shorts;
    private readonly int[]? _ints;

    private LevelCodes(byte[]? bytes, ushort[]? shorts, int[]? ints, int length)
    {
        (_bytes, _shorts, _ints, Length) = (bytes, shorts, ints, length);
    }

    /// <summary>Number of rows.</summary>
    public int Length { get; }

    /// <summary>Bytes a row in this form (1, 2 or 4).</summary>
    public int Width => _bytes is not null ? 1 : _shorts is not null ? 2 : 4;

    /// <summary>The level code of <paramref name="row"/>, or <see cref="FactorColumn.Missing"/>.</summary>
    public int this[int row]
    {
        [MethodImpl(MethodImplOptions.AggressiveInlining)] // read per row in the partition and the order checks
        get => _bytes is { } b ? b[row] - 1 : _shorts is { } s ? s[row] - 1 : _ints![row];
    }

    /// <summary>The codes of a column of <paramref name="levels"/> levels, each code first mapped through
    /// <paramref name="remap"/> when given (missing codes stay missing).</summary>
    public static LevelCodes From(ReadOnlySpan<int> codes, int levels, int[]? remap = null) => From(new SpanRowValues(codes), levels, remap);

    /// <summary>As <see cref="From(ReadOnlySpan{int}, int, int[])"/>, the codes read one at a time from
    /// <paramref name="codes"/> (a column computed on the fly needs no full-width copy first).</summary>
    internal static LevelCodes From<TColumn>(TColumn codes, int levels, int[]? remap = null)
        where TColumn : IRowValues, allows ref struct
    {
        ArgumentOutOfRangeException.ThrowIfNegative(levels);
        var length = codes.Length;
        if (levels < byte.MaxValue)
        {
            var bytes = GC.AllocateUninitializedArray<byte>(length);
            for (var i = 0; i < length; i++)
            {
                bytes[i] = (byte)(Checked(codes[i], levels, remap) + 1);
            }

            return new LevelCodes(bytes, null, null, length);
        }

        if (levels < ushort.MaxValue)
        {
            var shorts = GC.AllocateUninitializedArray<ushort>(length);
            for (var i = 0; i < length; i++)
            {
                shorts[i] = (ushort)(Checked(codes[i], levels, remap) + 1);
            }

            return new LevelCodes(null, shorts, null, length);
        }

        var ints = GC.AllocateUninitializedArray<int>(length);
        for (var i = 0; i < length; i++)
        {
            ints[i] = Checked(codes[i], levels, remap);
        }

        return new LevelCodes(null, null, ints, length);
    }

    /// <summary>The codes at <paramref name="rows"/>, in the same width.</summary>
    public LevelCodes Gathered(ReadOnlySpan<int> rows)
    {
        var result = Empty(rows.Length);
        for (var k = 0; k < rows.Length; k++)
        {
            result.CopyElement(k, this, rows[k]);
        }

        return result;
    }

    /// <summary>True when some row has no level.</summary>
    public bool AnyMissing() => _bytes is { } b ? b.AsSpan().Contains((byte)0) : _shorts is { } s ? s.AsSpan().Contains((ushort)0) : _ints!.AsSpan().IndexOfAnyInRange(int.MinValue, -1) >= 0;

    /// <summary>Codes of this width for <paramref name="length"/> rows, to be filled by <see cref="CopyElement"/>
    /// (every row must be written before the codes are read).</summary>
    internal LevelCodes Empty(int length) => new(
        _bytes is null ? null : GC.AllocateUninitializedArray<byte>(length),
        _shorts is null ? null : GC.AllocateUninitializedArray<ushort>(length),
        _ints is null ? null : GC.AllocateUninitializedArray<int>(length),
        length);

    /// <summary>Writes the code of <paramref name="source"/>'s row <paramref name="row"/> (same width) at <paramref name="at"/>.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)] // per row in the partition's sort
    internal void CopyElement(int at, LevelCodes source, int row)
    {
        if (_bytes is { } b)
        {
            b[at] = source._bytes![row];
        }
        else if (_shorts is { } s)
        {
            s[at] = source._shorts![row];
        }
        else
        {
            _ints![at] = source._ints![row];
        }
    }

    /// <summary>The codes at <paramref name="rows"/>, as a new array.</summary>
    public int[] Gather(ReadOnlySpan<int> rows) => RowValues.Gather(this, rows);

    /// <summary>Every row's code, as a new array.</summary>
    public int[] ToArray() => RowValues.All(this);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static int Checked(int code, int levels, int[]? remap)
    {
        if (code < 0)
        {
            return FactorColumn.Missing;
        }

        var mapped = remap is null ? code : remap[code];
        return (uint)mapped < (uint)levels ? mapped : throw new ArgumentOutOfRangeException(nameof(code), mapped, "a level code outside the column's levels");
    }
}
