using System.Runtime.Intrinsics;

namespace CellCheck.Core.Remedies;

/// <summary>
/// The series Σu = Σ_k λ^{k−1}·S_k/k! and Σu² = Σ_{k≥2} (2^k − 2)·λ^{k−2}·S_k/k! of <see cref="GroupedPowerSums"/>
/// for one block of <see cref="PowerSumTable.Lanes"/> groups at once, one group per vector lane. Each lane adds the
/// same products in the same order, and stops at the same term, as the one-group loop
/// (Σu += λ^{k−1}·S_k/k!, Σu² += (2^k − 2)·λ^{k−2}·S_k/k!, stopping once the bound 2n·∏ x/(j + 1) on the next term falls below <see cref="GroupedPowerSums.Negligible"/>): the powers of λ and 2^k are common to all lanes, and a lane that has
/// stopped (its own term count or stopping bound reached) keeps its values through the remaining terms of the block.
/// Vector arithmetic rounds each operation as the scalar one does (no fused multiply-add), so the results are the
/// same doubles.
/// </summary>
internal static class PowerSeries
{
    /// <summary>Σu, Σu² (before centring) and the last stopping bound of each lane of block b at λ: a lane's series
    /// stopped short of convergence when its bound is still ≥ <see cref="GroupedPowerSums.Negligible"/>.</summary>
    public static (Vector256<double> Sum, Vector256<double> Squares, Vector256<double> Bound) Block(PowerSumTable table, int b, double lambda)
    {
        var terms = PowerSumTable.Block(table.Terms, b);
        var x = Vector256.Create(2 * Math.Abs(lambda)) * PowerSumTable.Block(table.Reach, b);
        var bound = Vector256.Create(2.0) * PowerSumTable.Block(table.Size, b);
        var negligible = Vector256.Create(GroupedPowerSums.Negligible);
        var sums = table.BlockSums(b);
        var depth = sums.Length / PowerSumTable.Lanes;
        Vector256<double> sum = Vector256<double>.Zero, squares = Vector256<double>.Zero;
        var alive = Vector256<double>.AllBitsSet;
        double twoPower = 1, previous = 0, power = 1; // power = λ^(k−1), previous = λ^(k−2)
        for (var k = 1; k <= depth; k++)
        {
            twoPower *= 2;
            var term = Vector256.Create(sums.Slice((k - 1) * PowerSumTable.Lanes, PowerSumTable.Lanes));
            var active = alive & Vector256.LessThanOrEqual(Vector256.Create((double)k), terms);
            if (active == Vector256<double>.Zero)
            {
                break;
            }

            sum = Vector256.ConditionalSelect(active, sum + (Vector256.Create(power) * term), sum);
            if (k >= 2)
            {
                squares = Vector256.ConditionalSelect(active, squares + (Vector256.Create((twoPower - 2) * previous) * term), squares);
                var stopping = active & Vector256.LessThan(bound, negligible);
                alive = Vector256.AndNot(alive, stopping);
                bound = Vector256.ConditionalSelect(Vector256.AndNot(active, stopping), bound * (x * Vector256.Create(GroupedPowerSums.Reciprocal[k + 1])), bound);
            }

            previous = power;
            power *= lambda;
        }

        return (sum, squares, bound);
    }
}
