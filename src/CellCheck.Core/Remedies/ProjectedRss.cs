using CellCheck.Core.Models;

namespace CellCheck.Core.Remedies;

/// <summary>
/// Residual sum of squares on a linear model by one pivoted Householder QR of its design (<see cref="PivotedQr"/>,
/// Businger &amp; Golub 1965), reused for every response: with Qᵀv = (c₁, c₂), c₁ of length rank, the residual sum of
/// squares is ‖c₂‖². The response is centred first (the design holds an intercept), which keeps the rounding error
/// relative to the spread of v rather than its level. Cost per call: about 2·n·rank flops.
/// </summary>
internal sealed class ProjectedRss : IResidualSumOfSquares
{
    /// <summary>Machine epsilon 2⁻⁵².</summary>
    private const double DoubleEpsilon = 2.220446049250313e-16;

    private readonly PivotedQr qr;
    private readonly double[] work;

    /// <param name="x">The design, n × p, with an intercept column (or any columns whose span holds the constant).</param>
    public ProjectedRss(double[,] x)
    {
        ArgumentNullException.ThrowIfNull(x);
        var n = x.GetLength(0);
        qr = PivotedQr.Factor(x, 10 * n * DoubleEpsilon);
        work = new double[n];
    }

    public int Count => work.Length;

    public int ResidualDf => Count - qr.Rank;

    public double Of(ReadOnlySpan<double> v)
    {
        if (v.Length != Count)
        {
            throw new ArgumentException($"expected {Count} values, got {v.Length}", nameof(v));
        }

        var mean = 0.0;
        foreach (var x in v)
        {
            mean += x;
        }

        mean /= v.Length;
        for (var i = 0; i < v.Length; i++)
        {
            work[i] = v[i] - mean;
        }

        qr.ApplyQt(work);
        var total = 0.0;
        for (var i = qr.Rank; i < work.Length; i++)
        {
            total += work[i] * work[i];
        }

        return total;
    }
}
