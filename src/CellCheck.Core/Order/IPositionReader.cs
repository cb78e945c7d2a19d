namespace CellCheck.Core.Order;

/// <summary>Reads the run position at an index, from an array or counted on from a start (no array).</summary>
internal interface IPositionReader
{
    /// <summary>The run position at <paramref name="index"/>.</summary>
    double this[int index] { get; }
}
