using System.Runtime.Intrinsics;

namespace CellCheck.Core.Remedies;

/// <summary>
/// One evaluation of <see cref="GroupedPowerSums"/> over a range of blocks of groups: for each group g its scale
/// A_g = e^{half} with half = λ·c_g − top/2, its within-group sum of squares A_g²·(Σu² − (Σu)²/n) and, for the blocked
/// model, its mean of w, A_g·Σu/n + B_g with B_g = expm1(half)/λ (c_g − c_0 at λ = 0). Four groups at a time in
/// vector lanes, each lane the same operations as one group alone (so the same doubles); the series of expm1 runs
/// term by term across the whole range (<see cref="PreciseMath.ExpM1Near"/>); groups whose logs spread beyond the
/// series' reach are evaluated row by row. Each instance holds the scratch of one evaluation: evaluations side by side
/// take one instance each.
/// </summary>
internal sealed class BlockEvaluation
{
    private readonly int[] starts;
    private readonly KeptLogs logs;
    private readonly PowerSumTable table;
    private readonly double[] within;
    private readonly double[]? means;
    private readonly double[] halves;
    private readonly double[]? nearExpM1;

    /// <param name="blocked">True for the blocked model: each group's mean of w is formed as well.</param>
    public BlockEvaluation(int[] starts, KeptLogs logs, PowerSumTable table, bool blocked)
    {
        this.starts = starts;
        this.logs = logs;
        this.table = table;
        within = new double[table.Blocks * PowerSumTable.Lanes];
        means = blocked ? new double[within.Length] : null;
        BetweenResiduals = blocked ? new double[table.Groups] : null;
        halves = new double[within.Length];
        nearExpM1 = blocked ? new double[halves.Length] : null;
    }

    /// <summary>Each group's within-group sum of squares (one slot per group and padding lane).</summary>
    public double[] Within => within;

    /// <summary>Each group's mean of w (blocked model), or null.</summary>
    public double[]? Means => means;

    /// <summary>Room for the residuals of the group means on the model (blocked model), or null.</summary>
    public double[]? BetweenResiduals { get; }

    /// <summary>Fills the slots of blocks first .. last − 1 at λ (ranges may be evaluated in parallel).</summary>
    public void Evaluate(int first, int last, double lambda, double top, double reference)
    {
        Halves(first, last, lambda, top);
        for (var b = first; b < last; b++)
        {
            Block(b, lambda, reference);
        }
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
            | (Vector256.GreaterThanOrEqual(bounds, Vector256.Create(GroupedPowerSums.Negligible)) & Vector256.LessThan(PowerSumTable.Block(table.Terms, b), Vector256.Create((double)GroupedPowerSums.Terms)));
        var direct = (wide & Vector256.GreaterThan(size, Vector256<double>.Zero)).ExtractMostSignificantBits();
        for (var lane = 0; direct != 0; lane++, direct >>= 1)
        {
            if ((direct & 1) != 0)
            {
                var g = (b * PowerSumTable.Lanes) + lane;
                var n = starts[g + 1] - starts[g];
                var (sum, spreadRow) = logs.RowByRow(g, n, table.Centre[g], lambda);
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
}
