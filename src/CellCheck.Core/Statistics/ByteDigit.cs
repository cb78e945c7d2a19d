namespace CellCheck.Core.Statistics;

/// <summary>8-bit digits for medium samples, whose 256-bucket histograms cost little beside a few thousand values.</summary>
internal readonly struct ByteDigit : IRadixDigit
{
    public static int Bits => 8;
}
