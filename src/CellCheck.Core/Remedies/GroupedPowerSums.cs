using System.Runtime.Intrinsics;
using CellCheck.Core.Models;

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
/// tool reads. Cells whose logs spread further are evaluated row by row with <see cref="PreciseMath.ExpM1(double)"/>, as
/// <see cref="BoxCox"/> does for every model. Cells are combined by log-sum-exp, so nothing overflows for large |λ|.</para>
/// <para>For cells plus additive blocks the groups are the identical settings (a cell within a block): the residual sum
/// of squares is the within-group part above plus the weighted residual sum of squares of the group means of w on the
/// model, fitted by <see cref="CellBlockFit"/> with the group sizes as weights (the fit of a model that is constant
/// within groups splits this way).</para>
/// <para>The power sums are formed once (<see cref="PowerSumTable"/>); each evaluation sums the series for four groups
/// at a time (<see cref="PowerSeries"/>), in parallel over ranges of groups, each group into its own slot, the slots
/// then added in group order, so the value does not depend on the number of threads.</para>
/// </remarks>
internal sealed class GroupedPowerSums
{
    /// <summary>Series terms summed per cell.</summary>
    public const int Terms = 30;

    /// <summary>The stopping bound on a series term relative to the sum of squares: far below rounding.</summary>
    public const double Negligible = 1e-18;

    /// <summary>1/k for k ≤ Terms + 1 (a multiplication in the series loop instead of a division).</summary>
    internal static readonly double[] Reciprocal = [.. Enumerable.Range(0, Terms + 2).Select(k => k == 0 ? 0 : 1.0 / k)];

    /// <summary>Groups per parallel work item (a whole number of blocks).</summary>
    private const int Chunk = 2048;

    /// <summary>Largest group whose transformed values <see cref="Direct"/> keeps on the stack.</summary>
    private const int StackRows = 256;

    private readonly int[] starts;
    private readonly double[] logs;
    private readonly PowerSumTable table;
    private readonly double sumLog;
    private readonly CellBlockFit? between;

    // the extreme log-means among the groups that set the scale (none: top is −∞)
    private readonly bool anyScale;
    private readonly double lowCentre = double.PositiveInfinity, highCentre = double.NegativeInfinity;

    // scratch for one evaluation, reused (the optimiser evaluates one λ at a time)
    private readonly double[] within;
    private readonly double[]? means;
    private readonly double[]? betweenResiduals;
    private readonly double[] halves;
    private readonly double[]? nearExpM1;

    /// <param name="starts">Group g holds rows starts[g] .. starts[g + 1] − 1 of <paramref name="logs"/>.</param>
    /// <param name="logs">log y of every row, grouped.</param>
    /// <param name="between">For groups that are not the model's cells (identical settings of cells and blocks), the
    /// weighted fit of the model to the group means; null when the groups are the cells of the cell-means model.</param>
    public GroupedPowerSums(int[] starts, double[] logs, CellBlockFit? between = null)
    {
        this.starts = starts;
        this.between = between;
        this.logs = logs;
        var groups = starts.Length - 1;
        table = new PowerSumTable(starts, logs);
        within = new double[table.Blocks * PowerSumTable.Lanes];
        means = between is null ? null : new double[within.Length];
        betweenResiduals = between is null ? null : new double[groups];
        halves = new double[table.Blocks * PowerSumTable.Lanes];
        nearExpM1 = between is null ? null : new double[halves.Length];
        foreach (var l in logs)
        {
            sumLog += l;
        }

        for (var g = 0; g < groups; g++)
        {
            if (starts[g + 1] - starts[g] > (between is null ? 1 : 0))
            {
                anyScale = true;
                lowCentre = Math.Min(lowCentre, table.Centre[g]);
                highCentre = Math.Max(highCentre, table.Centre[g]);
            }
        }
    }

    /// <summary>ℓ(λ) as defined by <see cref="BoxCox"/>.</summary>
    public double LogLikelihood(double lambda)
    {
        var groups = table.Groups;

        // the largest 2λ·c_g: rounding is monotone, so it is 2λ times the largest (λ ≥ +0) or smallest (λ ≤ −0) c_g
        var top = !anyScale ? double.NegativeInfinity : 2 * lambda * (double.IsNegative(lambda) ? lowCentre : highCentre);

        // with λ·log y_r = top/2: y^(λ) = e^{top/2}·w + constant, and in group g w = A_g·u + B_g
        var reference = lambda == 0 ? table.Centre[0] : 0;
        Parallel.For(0, (groups + Chunk - 1) / Chunk, chunk =>
        {
            var first = chunk * Chunk / PowerSumTable.Lanes;
            var last = Math.Min(table.Blocks, (chunk + 1) * Chunk / PowerSumTable.Lanes);
            Halves(first, last, lambda, top);
            for (var b = first; b < last; b++)
            {
                Block(b, lambda, reference);
            }
        });
        var total = 0.0;
        foreach (var part in within.AsSpan(0, groups))
        {
            total += part;
        }

        if (means is not null)
        {
            var residuals = betweenResiduals!;
            between!.Residualize(means.AsSpan(0, groups), residuals);
            for (var g = 0; g < groups; g++)
            {
                total += (starts[g + 1] - starts[g]) * residuals[g] * residuals[g];
            }
        }

        var count = logs.Length;
        return ((lambda - 1) * sumLog) - (count / 2.0 * (top + Math.Log(total) - Math.Log(count)));
    }

    /// <summary>The number of series terms that the series uses at most for a group of n values whose centred logs
    /// reach <paramref name="reach"/>, over the whole search range of λ (the same stopping rule at the largest |λ|, on the
    /// series route): power sums above it are never read, so they are not formed.</summary>
    internal static int TermsWithin(int n, double reach)
    {
        var x = 2 * Math.Min(1.0, Math.Max(-BoxCox.SearchLower, BoxCox.SearchUpper) * reach);
        var bound = 2.0 * n;
        for (var k = 2; k <= Terms; k++)
        {
            if (bound < Negligible)
            {
                return k;
            }

            bound *= x * Reciprocal[k + 1];
        }

        return Terms;
    }

    /// <summary>λ·c_g − top/2 for the groups of blocks first .. last − 1, and its expm1 where it is below 1/2 in size.</summary>
    private void Halves(int first, int last, double lambda, double top)
    {
        var (l, t) = (Vector256.Create(lambda), Vector256.Create(top / 2));
        for (var b = first; b < last; b++)
        {
            ((l * PowerSumTable.Block(table.Centre, b)) - t).CopyTo(halves.AsSpan(b * PowerSumTable.Lanes));
        }

        if (nearExpM1 is not null && lambda != 0)
        {
            var range = new Range(first * PowerSumTable.Lanes, last * PowerSumTable.Lanes);
            PreciseMath.ExpM1Near(halves.AsSpan(range), nearExpM1.AsSpan(range));
        }
    }

    /// <summary>Within-group sum of squares and mean of w for the groups of block b, lane by lane the same operations as
    /// for one group: A_g = e^{half}, within = A_g²·(Σu² − (Σu)²/n) (0 for a single row), mean = A_g·Σu/n + B_g.</summary>
    private void Block(int b, double lambda, double reference)
    {
        var (sums, squares, bounds) = PowerSeries.Block(table, b, lambda);
        var lanes = new Range(b * PowerSumTable.Lanes, (b + 1) * PowerSumTable.Lanes);
        var size = PowerSumTable.Block(table.Size, b);
        var half = Vector256.Create(halves.AsSpan(lanes));
        var a = Vector256.Create(Math.Exp(half.GetElement(0)), Math.Exp(half.GetElement(1)), Math.Exp(half.GetElement(2)), Math.Exp(half.GetElement(3)));
        var spread = squares - (sums * sums / size);
        Vector256.ConditionalSelect(Vector256.GreaterThan(size, Vector256<double>.One), a * a * spread, Vector256<double>.Zero).CopyTo(within.AsSpan(lanes));
        Vector256<double> shift = default;
        if (means is not null)
        {
            shift = lambda == 0 ? PowerSumTable.Block(table.Centre, b) - Vector256.Create(reference) : Shifts(b, half, a, lambda);
            var mean = ((a * sums) / size) + shift;
            Vector256.ConditionalSelect(Vector256.Equals(size, Vector256<double>.Zero), Vector256<double>.Zero, mean).CopyTo(means.AsSpan(lanes));
        }

        // the series where it converges: |λ|·reach ≤ 1, and the terms kept suffice (always, inside the search range);
        // elsewhere row by row
        var wide = Vector256.GreaterThan(Vector256.Create(Math.Abs(lambda)) * PowerSumTable.Block(table.Reach, b), Vector256<double>.One)
            | (Vector256.GreaterThanOrEqual(bounds, Vector256.Create(Negligible)) & Vector256.LessThan(PowerSumTable.Block(table.Terms, b), Vector256.Create((double)Terms)));
        var direct = (wide & Vector256.GreaterThan(size, Vector256<double>.Zero)).ExtractMostSignificantBits();
        for (var lane = 0; direct != 0; lane++, direct >>= 1)
        {
            if ((direct & 1) != 0)
            {
                var g = (b * PowerSumTable.Lanes) + lane;
                var n = starts[g + 1] - starts[g];
                var (sum, spreadRow) = Direct(g, n, lambda);
                var ag = a.GetElement(lane);
                within[g] = n > 1 ? ag * ag * spreadRow : 0;
                means?[g] = (ag * sum / n) + shift.GetElement(lane);
            }
        }
    }

    /// <summary>B_g·λ = expm1(half) for the lanes of block b (λ ≠ 0): the series already formed where |half| &lt; 1/2,
    /// else from the exponential A_g.</summary>
    private Vector256<double> Shifts(int b, Vector256<double> half, Vector256<double> a, double lambda)
    {
        var lanes = new Range(b * PowerSumTable.Lanes, (b + 1) * PowerSumTable.Lanes);
        var far = Vector256.GreaterThanOrEqual(Vector256.Abs(half), Vector256.Create(0.5)).ExtractMostSignificantBits();
        if (far == 0)
        {
            return Vector256.Create(nearExpM1.AsSpan(lanes)) / Vector256.Create(lambda);
        }

        Span<double> expm1 = stackalloc double[PowerSumTable.Lanes];
        for (var lane = 0; lane < PowerSumTable.Lanes; lane++)
        {
            var g = (b * PowerSumTable.Lanes) + lane;
            expm1[lane] = (far & (1u << lane)) != 0 ? PreciseMath.ExpM1(halves[g], a.GetElement(lane)) : nearExpM1![g];
        }

        return Vector256.Create(expm1) / Vector256.Create(lambda);
    }

    /// <summary>Σu and Σu² − (Σu)²/n for group g row by row, with u = expm1(λe)/λ.</summary>
    private (double Sum, double Squares) Direct(int g, int n, double lambda)
    {
        var cell = logs.AsSpan(starts[g], n);
        var rented = n > StackRows ? System.Buffers.ArrayPool<double>.Shared.Rent(n) : null;
        var u = rented is null ? stackalloc double[StackRows] : rented.AsSpan();
        var centre = table.Centre[g];
        double sum = 0, squares = 0;
        for (var i = 0; i < n; i++)
        {
            u[i] = PreciseMath.ExpM1(lambda * (cell[i] - centre)) / lambda;
            sum += u[i];
        }

        var mean = sum / n;
        for (var i = 0; i < n; i++)
        {
            var d = u[i] - mean;
            squares += d * d;
        }

        if (rented is not null)
        {
            System.Buffers.ArrayPool<double>.Shared.Return(rented);
        }

        return (sum, squares);
    }
}
