namespace CellCheck.Core.Remedies;

/// <summary>
/// The Box-Cox profile log-likelihood of the cell-means model (see <see cref="BoxCox"/>) evaluated from per-cell
/// power sums of the centred logs, so that one evaluation costs a few dozen operations per cell instead of an
/// exponential per row: at a million rows the profile's few hundred evaluations drop from seconds to milliseconds.
/// </summary>
/// <remarks>
/// <para>Within cell g with log-mean c_g and centred logs e_i = log y_i − c_g, the transformed values are
/// y_i^(λ) = e^{λc_g}·u_i + constant with u_i = expm1(λe_i)/λ, so the cell's residual sum of squares is
/// e^{2λc_g}·(Σu² − (Σu)²/n_g). With S_k = Σ e_i^k the Taylor series of the exponential give
/// Σu = Σ_{k≥1} λ^{k−1} S_k / k! and Σu² = Σ_{k≥2} (2^k − 2) λ^{k−2} S_k / k!
/// (from u² = (expm1(2λe) − 2·expm1(λe))/λ², whose linear terms cancel exactly, so no cancellation is left).</para>
/// <para>The series are summed to <see cref="Terms"/> terms where |λ|·max|e_i| ≤ 1 in the cell; there the
/// truncation error is below n·2³⁰/30! ≈ 4·10⁻²⁴·n relative to Σe², far below double precision for any n this
/// tool reads. Cells whose logs spread further are evaluated row by row with <see cref="PreciseMath.ExpM1"/>, as
/// <see cref="BoxCox"/> does for every model. Cells are combined by log-sum-exp, so nothing overflows for large |λ|.</para>
/// </remarks>
internal sealed class GroupedPowerSums
{
    /// <summary>Series terms summed per cell.</summary>
    public const int Terms = 30;

    private readonly int[] starts;
    private readonly double[] logs;
    private readonly double[] centre;
    private readonly double[] reach;
    private readonly double[] sums;
    private readonly double sumLog;

    /// <param name="starts">Cell g holds rows starts[g] .. starts[g + 1] − 1 of <paramref name="logs"/>.</param>
    /// <param name="logs">log y of every row, grouped by cell.</param>
    public GroupedPowerSums(int[] starts, double[] logs)
    {
        this.starts = starts;
        this.logs = logs;
        var groups = starts.Length - 1;
        centre = new double[groups];
        reach = new double[groups];
        sums = new double[groups * (Terms + 1)];
        foreach (var l in logs)
        {
            sumLog += l;
        }

        for (var g = 0; g < groups; g++)
        {
            var cell = logs.AsSpan(starts[g], starts[g + 1] - starts[g]);
            if (cell.Length == 0)
            {
                continue;
            }

            centre[g] = Statistics.Descriptive.Mean(cell);
            var s = sums.AsSpan(g * (Terms + 1), Terms + 1);
            foreach (var l in cell)
            {
                var e = l - centre[g];
                reach[g] = Math.Max(reach[g], Math.Abs(e));
                var power = e;
                for (var k = 1; k <= Terms; k++)
                {
                    s[k] += power;
                    power *= e;
                }
            }
        }
    }

    /// <summary>ℓ(λ) as defined by <see cref="BoxCox"/>.</summary>
    public double LogLikelihood(double lambda)
    {
        var groups = centre.Length;
        var top = double.NegativeInfinity;
        for (var g = 0; g < groups; g++)
        {
            if (starts[g + 1] - starts[g] > 1)
            {
                top = Math.Max(top, 2 * lambda * centre[g]);
            }
        }

        var total = 0.0;
        for (var g = 0; g < groups; g++)
        {
            var n = starts[g + 1] - starts[g];
            if (n > 1)
            {
                total += Math.Exp((2 * lambda * centre[g]) - top) * CentredSquares(g, n, lambda);
            }
        }

        var count = logs.Length;
        return ((lambda - 1) * sumLog) - (count / 2.0 * (top + Math.Log(total) - Math.Log(count)));
    }

    /// <summary>Σu² − (Σu)²/n for cell g, with u = expm1(λe)/λ (e at λ = 0).</summary>
    private double CentredSquares(int g, int n, double lambda)
    {
        if (Math.Abs(lambda) * reach[g] > 1)
        {
            return Direct(g, n, lambda);
        }

        var s = sums.AsSpan(g * (Terms + 1), Terms + 1);
        double sum = 0, squares = 0, factorial = 1, twoPower = 1;
        double previous = 0, power = 1; // power = λ^(k−1), previous = λ^(k−2)
        for (var k = 1; k <= Terms; k++)
        {
            factorial *= k;
            twoPower *= 2;
            var term = s[k] / factorial;
            sum += power * term;
            if (k >= 2)
            {
                squares += (twoPower - 2) * previous * term;
            }

            previous = power;
            power *= lambda;
        }

        return squares - (sum * sum / n);
    }

    private double Direct(int g, int n, double lambda)
    {
        var cell = logs.AsSpan(starts[g], n);
        double mean = 0, squares = 0;
        foreach (var l in cell)
        {
            mean += PreciseMath.ExpM1(lambda * (l - centre[g])) / lambda;
        }

        mean /= n;
        foreach (var l in cell)
        {
            var d = (PreciseMath.ExpM1(lambda * (l - centre[g])) / lambda) - mean;
            squares += d * d;
        }

        return squares;
    }
}
