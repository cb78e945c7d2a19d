namespace CellCheck.Core.Statistics;

/// <summary>The tests of equal spread that <see cref="SpreadKernel"/> computes together.</summary>
[Flags]
internal enum SpreadTests
{
    None = 0,
    Levene = 1,
    BrownForsythe = 2,
    BrownForsytheZerosRemoved = 4,
    Bartlett = 8,
    FlignerKilleen = 16,
    All = Levene | BrownForsythe | BrownForsytheZerosRemoved | Bartlett | FlignerKilleen,
}
