namespace CellCheck.Core.Order;

/// <summary>Run positions held in a span.</summary>
internal readonly ref struct HeldPositions(ReadOnlySpan<double> positions) : IPositionReader
{
    private readonly ReadOnlySpan<double> _positions = positions;

    public double this[int index] => _positions[index];
}
