namespace CellCheck.Core.Tests.Scale;

/// <summary>
/// Neumaier's (1974) compensated summation ("Rundungsfehleranalyse einiger Verfahren zur Summation endlicher Summen",
/// ZAMM 54, 39-51): the rounding error of every addition is carried separately, so the sum of n terms is correct to
/// about 2ε·Σ|x| whatever n, where plain summation may lose (n − 1)ε·Σ|x|. The reference side of the large-input
/// tests sums with this, so its own rounding stays far below the tolerance it is compared at.
/// </summary>
internal struct CompensatedSum
{
    private double _sum;
    private double _carry;

    /// <summary>The sum so far.</summary>
    public readonly double Value => _sum + _carry;

    public void Add(double x)
    {
        var t = _sum + x;
        _carry += Math.Abs(_sum) >= Math.Abs(x) ? (_sum - t) + x : (x - t) + _sum;
        _sum = t;
    }

    /// <summary>Σ x over a span.</summary>
    public static double Of(ReadOnlySpan<double> x)
    {
        var sum = default(CompensatedSum);
        foreach (var v in x)
        {
            sum.Add(v);
        }

        return sum.Value;
    }
}
