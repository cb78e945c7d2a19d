namespace CellCheck.Core.Statistics;

/// <summary>The digit width of a <see cref="RadixPasses"/> sort, as a type so that each width's passes are compiled
/// with it as a constant.</summary>
internal interface IRadixDigit
{
    /// <summary>Bits per digit.</summary>
    static abstract int Bits { get; }
}
