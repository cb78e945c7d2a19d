using System.Runtime.Intrinsics;

namespace CellCheck.Core.Remedies;

/// <summary>
/// The per-group quantities of <see cref="GroupedPowerSums"/>: each group's log-mean c_g, reach max|e_i|, size and
/// number of series terms, and the power sums S_k/k! of its centred logs e_i = log y_i − c_g, laid out for
/// <see cref="PowerSeries"/>: groups in blocks of <see cref="Lanes"/>, block b holding term k of its lanes at
/// Sums[Offsets[b] + (k − 1)·Lanes + lane] for k up to the block's largest term count (so only the terms a group
/// can use are stored). Built in parallel over groups; every group's numbers are formed in the same order as the
/// plain one-row-at-a-time loops (sums in row order, powers by repeated multiplication), so they are the same doubles
/// (<see cref="BlockPowers"/>).
/// </summary>
internal sealed class PowerSumTable
{
    /// <summary>Groups per block: the width of a 256-bit vector of doubles.</summary>
    public const int Lanes = 4;

    /// <summary>Groups per parallel work item (a whole number of blocks).</summary>
    private const int Chunk = 1024;

    public PowerSumTable(int[] starts, double[] logs)
    {
        Groups = starts.Length - 1;
        Blocks = (Groups + Lanes - 1) / Lanes;
        var padded = Blocks * Lanes;
        Centre = new double[padded];
        Reach = new double[padded];
        Size = new double[padded];
        Terms = new double[padded];
        Offsets = new int[Blocks + 1];
        var chunks = (Groups + Chunk - 1) / Chunk;
        Parallel.For(0, chunks, chunk =>
        {
            for (var g = chunk * Chunk; g < Math.Min(Groups, (chunk + 1) * Chunk); g++)
            {
                var cell = logs.AsSpan(starts[g], starts[g + 1] - starts[g]);
                Size[g] = cell.Length;
                if (cell.Length == 0)
                {
                    continue;
                }

                var centre = Centre[g] = Statistics.Descriptive.Mean(cell);
                var reach = 0.0;
                foreach (var l in cell)
                {
                    reach = Math.Max(reach, Math.Abs(l - centre));
                }

                Reach[g] = reach;
                Terms[g] = GroupedPowerSums.TermsWithin(cell.Length, reach);
            }
        });
        for (var b = 0; b < Blocks; b++)
        {
            var depth = 0.0;
            for (var lane = 0; lane < Lanes; lane++)
            {
                depth = Math.Max(depth, Terms[(b * Lanes) + lane]);
            }

            Offsets[b + 1] = Offsets[b] + ((int)depth * Lanes);
        }

        Sums = new double[Offsets[Blocks]];
        Parallel.For(0, chunks, chunk =>
        {
            Span<double> accumulated = stackalloc double[BlockPowers.Scratch];
            for (var b = chunk * Chunk / Lanes; b < Math.Min(Blocks, (chunk + 1) * Chunk / Lanes); b++)
            {
                BlockPowers.Fill(starts, logs, this, b, Sums.AsSpan(Offsets[b], Offsets[b + 1] - Offsets[b]), accumulated);
            }
        });
    }

    public int Groups { get; }

    public int Blocks { get; }

    /// <summary>c_g, the mean log of group g (0 for an empty group and for the padding after the last group).</summary>
    public double[] Centre { get; }

    /// <summary>max |log y_i − c_g| over group g.</summary>
    public double[] Reach { get; }

    /// <summary>Rows in group g (0 for padding).</summary>
    public double[] Size { get; }

    /// <summary>Series terms kept for group g (<see cref="GroupedPowerSums.TermsWithin"/>; 0 when empty).</summary>
    public double[] Terms { get; }

    /// <summary>Start of block b's terms in <see cref="Sums"/>; block b holds (Offsets[b + 1] − Offsets[b])/Lanes terms.</summary>
    public int[] Offsets { get; }

    /// <summary>S_k/k! by block, term and lane (see the class summary).</summary>
    public double[] Sums { get; }

    /// <summary>A vector of <see cref="Lanes"/> per-group values of block b.</summary>
    public static Vector256<double> Block(double[] values, int b) => Vector256.Create(values.AsSpan(b * Lanes, Lanes));
}
