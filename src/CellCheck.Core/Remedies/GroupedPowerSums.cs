using System.Collections.Concurrent;
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
/// at a time (<see cref="PowerSeries"/>, <see cref="BlockEvaluation"/>), in parallel over ranges of groups, each group into its own slot, the slots
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

    private readonly int[] starts;
    private readonly int count;
    private readonly PowerSumTable table;
    private readonly double sumLog;
    private readonly CellBlockFit? between;

    // the extreme log-means among the groups that set the scale (none: top is −∞)
    private readonly bool anyScale;
    private readonly double lowCentre = double.PositiveInfinity, highCentre = double.NegativeInfinity;

    // the scratch of one evaluation each, reused: evaluations side by side take one each
    private readonly KeptLogs kept;
    private readonly ConcurrentBag<BlockEvaluation> idle = [];

    /// <param name="starts">Group g holds rows starts[g] .. starts[g + 1] − 1 of <paramref name="logs"/>.</param>
    /// <param name="logs">log y of every row, grouped.</param>
    /// <param name="between">For groups that are not the model's cells (identical settings of cells and blocks), the
    /// weighted fit of the model to the group means; null when the groups are the cells of the cell-means model.</param>
    public GroupedPowerSums(int[] starts, double[] logs, CellBlockFit? between = null)
        : this(starts, new HeldLogs(logs), between)
    {
    }

    /// <param name="starts">Group g holds positions starts[g] .. starts[g + 1] − 1 of <paramref name="logs"/>.</param>
    /// <param name="logs">log y, grouped, formed range by range while the sums are formed and then kept only for the
    /// groups that may need them later (<see cref="KeptLogs"/>).</param>
    /// <param name="between">As for the other constructor.</param>
    /// <exception cref="ArgumentException">A value is not positive and finite.</exception>
    public GroupedPowerSums(int[] starts, ILogSource logs, CellBlockFit? between = null)
    {
        this.starts = starts;
        this.between = between;
        count = logs.Count;
        var groups = starts.Length - 1;
        table = new PowerSumTable(starts, logs);
        kept = table.Kept;
        sumLog = table.SumLog;

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

    /// <summary>ℓ(λ) as defined by <see cref="BoxCox"/>, for λ in the search range (|λ| ≤ <see cref="KeptLogs.LambdaLimit"/>).
    /// Safe to call side by side: each call works in scratch of its own, so its value does not depend on other calls.</summary>
    public double LogLikelihood(double lambda)
    {
        ArgumentOutOfRangeException.ThrowIfGreaterThan(Math.Abs(lambda), KeptLogs.LambdaLimit, nameof(lambda));
        if (!idle.TryTake(out var evaluation))
        {
            evaluation = new BlockEvaluation(starts, kept, table, between is not null);
        }

        var value = LogLikelihood(lambda, evaluation);
        idle.Add(evaluation);
        return value;
    }

    private double LogLikelihood(double lambda, BlockEvaluation blocks)
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
            blocks.Evaluate(first, last, lambda, top, reference);
        });
        var (within, means) = (blocks.Within, blocks.Means);
        var total = 0.0;
        foreach (var part in within.AsSpan(0, groups))
        {
            total += part;
        }

        if (means is not null)
        {
            var residuals = blocks.BetweenResiduals!;
            between!.Residualize(means.AsSpan(0, groups), residuals);
            for (var g = 0; g < groups; g++)
            {
                total += (starts[g + 1] - starts[g]) * residuals[g] * residuals[g];
            }
        }

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
}
