using System.Runtime.Intrinsics;

namespace CellCheck.Core.Remedies;

/// <summary>
/// The power sums S_k/k! of the centred logs of one block of <see cref="PowerSumTable.Lanes"/> groups, one group per
/// vector lane: the kernel of <see cref="PowerSumTable"/>. Row r of every group is taken at once; each lane adds
/// e_r^k to its k-th sum in row order, with e_r^k formed by repeated multiplication, so each group gets the same doubles
/// as the plain loop over its rows alone. A lane past the end of its group reads its own centre, so that e = +0 and
/// the sums it adds are +0, which leaves them unchanged (a sum that starts at +0 never becomes −0). Terms above a
/// group's own count are formed too but never read.
/// </summary>
internal static class BlockPowers
{
    /// <summary>The length of the scratch that <see cref="Fill"/> needs.</summary>
    public const int Scratch = GroupedPowerSums.Terms * PowerSumTable.Lanes;

    /// <summary>Writes S_k/k! for k = 1..depth of block b to <paramref name="sums"/> (term k of the lanes at (k − 1)·Lanes).</summary>
    /// <param name="accumulated">Scratch of at least <see cref="Scratch"/> values.</param>
    /// <param name="logs">The logs of positions <paramref name="from"/> onward, through the end of block b.</param>
    public static void Fill(int[] starts, ReadOnlySpan<double> logs, int from, PowerSumTable table, int b, Span<double> sums, Span<double> accumulated)
    {
        const int lanes = PowerSumTable.Lanes;
        var depth = sums.Length / lanes;
        var acc = accumulated[..(depth * lanes)];
        acc.Clear();
        var centre = PowerSumTable.Block(table.Centre, b);
        Span<int> first = stackalloc int[lanes];
        Span<int> size = stackalloc int[lanes];
        Span<double> row = stackalloc double[lanes];
        var rows = 0;
        for (var lane = 0; lane < lanes; lane++)
        {
            var g = (b * lanes) + lane;
            first[lane] = g < table.Groups ? starts[g] - from : 0;
            size[lane] = g < table.Groups ? starts[g + 1] - starts[g] : 0;
            rows = Math.Max(rows, size[lane]);
        }

        for (var r = 0; r < rows; r++)
        {
            for (var lane = 0; lane < lanes; lane++)
            {
                row[lane] = r < size[lane] ? logs[first[lane] + r] : centre.GetElement(lane);
            }

            var e = Vector256.Create(row) - centre;
            var power = e;
            for (var k = 0; k < depth; k++)
            {
                (Vector256.Create(acc.Slice(k * lanes, lanes)) + power).CopyTo(acc.Slice(k * lanes, lanes));
                power *= e;
            }
        }

        var factorial = 1.0;
        for (var k = 1; k <= depth; k++)
        {
            factorial *= k;
            (Vector256.Create(acc.Slice((k - 1) * lanes, lanes)) / Vector256.Create(factorial)).CopyTo(sums.Slice((k - 1) * lanes, lanes));
        }
    }
}
