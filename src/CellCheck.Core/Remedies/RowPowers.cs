using System.Runtime.Intrinsics;

namespace CellCheck.Core.Remedies;

/// <summary>
/// Power sums Σ e_i^k, k = 1..K, of the centred values e_i = x_i − c of one group: the kernel of
/// <see cref="PowerSumTable"/>. Gives the same doubles as the plain loop (for each row in turn: p = e, then for each k
/// add p to the k-th sum and multiply p by e), which is a chain of K dependent multiplications per row; here eight
/// rows at a time form their powers side by side in two vectors (each lane repeating the plain loop's
/// multiplications), and each sum then adds the eight in row order, the K sums being independent of each other.
/// </summary>
internal static class RowPowers
{
    private const int Tile = 2 * PowerSumTable.Lanes;

    /// <summary>The length of the scratch that <see cref="Accumulate"/> needs.</summary>
    public const int Scratch = Tile * GroupedPowerSums.Terms;

    /// <summary>Adds Σ (x_i − <paramref name="centre"/>)^k, in row order, to sums[k] for k = 1..<paramref name="terms"/>.</summary>
    /// <param name="powers">Scratch of at least <see cref="Scratch"/> values (the caller's, reused across groups).</param>
    public static void Accumulate(ReadOnlySpan<double> x, double centre, int terms, Span<double> sums, Span<double> powers)
    {
        Span<double> tile = stackalloc double[Tile];
        var c = Vector256.Create(centre);
        for (var start = 0; start < x.Length; start += Tile)
        {
            var rows = Math.Min(Tile, x.Length - start);
            tile.Clear();
            x.Slice(start, rows).CopyTo(tile);
            var e0 = Vector256.Create(tile[..PowerSumTable.Lanes]) - c;
            var e1 = Vector256.Create(tile[PowerSumTable.Lanes..]) - c;
            Vector256<double> p0 = e0, p1 = e1;
            for (var k = 1; k <= terms; k++)
            {
                p0.CopyTo(powers[((k - 1) * Tile)..]);
                p1.CopyTo(powers[(((k - 1) * Tile) + PowerSumTable.Lanes)..]);
                p0 *= e0;
                p1 *= e1;
            }

            for (var k = 1; k <= terms; k++)
            {
                var row = powers.Slice((k - 1) * Tile, rows);
                var sum = sums[k];
                foreach (var p in row)
                {
                    sum += p;
                }

                sums[k] = sum;
            }
        }
    }
}
