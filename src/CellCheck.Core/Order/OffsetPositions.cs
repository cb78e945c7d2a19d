namespace CellCheck.Core.Order;

/// <summary>Whole-number run positions held as 32-bit offsets from the first: position i is first + offsets[i], exactly.</summary>
internal readonly ref struct OffsetPositions(ReadOnlySpan<int> offsets, double first) : IPositionReader
{
    private readonly ReadOnlySpan<int> _offsets = offsets;

    public double this[int index] => first + _offsets[index];
}
