namespace CellCheck.Core.Statistics;

/// <summary>11-bit digits for long samples: 2048 buckets keep every pass's scatter targets within the cache (16-bit
/// digits, with 65 536 targets, spent most of their time in cache and TLB misses).</summary>
internal readonly struct WideDigit : IRadixDigit
{
    public static int Bits => 11;
}
