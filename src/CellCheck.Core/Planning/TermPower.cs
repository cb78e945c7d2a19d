namespace CellCheck.Core.Planning;

/// <summary>The power of one term's F test with <see cref="Replicates"/> rows per cell: numerator and residual degrees
/// of freedom, noncentrality λ and the chance to reject at alpha.</summary>
public sealed record TermPower(double Replicates, int Df1, double Df2, double Lambda, double Power);
