namespace CellCheck.Core.Order;

/// <summary>Run positions counted on from a whole-number start, one a row: position i is start + i, exactly.</summary>
internal readonly struct CountedPositions(double start) : IPositionReader
{
    public double this[int index] => start + index;
}
