namespace CellCheck.Core.Statistics;

/// <summary>
/// Neumaier's (1974) compensated summation ("Rundungsfehleranalyse einiger Verfahren zur Summation endlicher Summen",
/// ZAMM 54, 39-51): the rounding error of every addition is carried separately, so a sum of n terms is correct to about
/// 2ε·Σ|x| whatever n, where plain summation may lose (n − 1)ε·Σ|x|.
/// </summary>
internal struct NeumaierSum
{
    private double _sum;
    private double _carry;

    /// <summary>The sum so far.</summary>
    public readonly double Value => _sum + _carry;

    /// <summary>Adds one term.</summary>
    public void Add(double x)
    {
        var t = _sum + x;
        _carry += Math.Abs(_sum) >= Math.Abs(x) ? (_sum - t) + x : (x - t) + _sum;
        _sum = t;
    }
}
