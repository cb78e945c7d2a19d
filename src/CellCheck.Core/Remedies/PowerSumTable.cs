using System.Buffers;
using System.Runtime.Intrinsics;

namespace CellCheck.Core.Remedies;

/// <summary>
/// The per-group quantities of <see cref="GroupedPowerSums"/>: each group's log-mean c_g, reach max|e_i|, size and
/// number of series terms, and the power sums S_k/k! of its centred logs e_i = log y_i − c_g, laid out for
/// <see cref="PowerSeries"/>: groups in blocks of <see cref="Lanes"/>, block b holding term k of its lanes at
/// BlockSums(b)[(k − 1)·Lanes + lane] for k up to the block's largest term count (so only the terms a group can use
/// are stored). Built in parallel over ranges of whole blocks of about <see cref="ChunkRows"/> rows, whose logs are
/// formed in a buffer of the range's own (<see cref="ILogSource"/>), read and dropped, so no array of the data's length
/// is held; every group's numbers are formed in the same order as the plain one-row-at-a-time loops (sums in row
/// order, powers by repeated multiplication), so they are the same doubles (<see cref="BlockPowers"/>).
/// </summary>
internal sealed class PowerSumTable
{
    /// <summary>Groups per block: the width of a 256-bit vector of doubles.</summary>
    public const int Lanes = 4;

    /// <summary>Rows per parallel work item (whole blocks; a block larger than this is an item of its own): the
    /// logs of one item are formed in a buffer of its own, read, and dropped.</summary>
    private const int ChunkRows = 1 << 16;

    /// <param name="starts">Group g holds positions starts[g] .. starts[g + 1] − 1 of <paramref name="logs"/>.</param>
    /// <exception cref="ArgumentException">A value is not positive and finite (<see cref="ILogSource.Failure"/>).</exception>
    public PowerSumTable(int[] starts, ILogSource logs)
    {
        Groups = starts.Length - 1;
        Blocks = (Groups + Lanes - 1) / Lanes;
        var padded = Blocks * Lanes;
        Centre = new double[padded];
        Reach = new double[padded];
        Size = new double[padded];
        Terms = new double[padded];
        var sums = new double[Groups];
        var far = new double[]?[Groups];
        var chunks = BlockSumParts.Cut(starts, Lanes, ChunkRows);
        var parts = new double[chunks.Count - 1][];
        var failed = 0;
        Parallel.For(0, chunks.Count - 1, i =>
        {
            var (firstBlock, endBlock) = (chunks[i], chunks[i + 1]);
            var (first, end) = (firstBlock * Lanes, Math.Min(Groups, endBlock * Lanes));
            var from = starts[first];
            var buffer = ArrayPool<double>.Shared.Rent(starts[end] - from);
            try
            {
                var chunk = buffer.AsSpan(0, starts[end] - from);
                if (Volatile.Read(ref failed) != 0 || !logs.TryFill(from, chunk))
                {
                    Volatile.Write(ref failed, 1);
                    return;
                }

                for (var g = first; g < end; g++)
                {
                    Describe(g, chunk.Slice(starts[g] - from, starts[g + 1] - starts[g]), sums, far);
                }

                parts[i] = Powers(starts, chunk, from, firstBlock, endBlock);
            }
            finally
            {
                ArrayPool<double>.Shared.Return(buffer);
            }
        });
        if (failed != 0)
        {
            throw logs.Failure();
        }

        sumParts = new BlockSumParts(parts, chunks, b => Depth(b) * Lanes);
        var sumLog = default(Statistics.NeumaierSum);
        foreach (var sum in sums)
        {
            sumLog.Add(sum);
        }

        SumLog = sumLog.Value;
        Kept = new KeptLogs(far);
    }

    private readonly BlockSumParts sumParts;

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

    /// <summary>Number of power sums stored.</summary>
    public int Stored => sumParts.Stored;

    /// <summary>S_k/k! of block b by term and lane: term k of the lanes at (k − 1)·Lanes, for k up to the block's largest
    /// term count (see the class summary).</summary>
    public ReadOnlySpan<double> BlockSums(int b) => sumParts.Of(b);

    /// <summary>Σ log y: each group's logs summed in order, the groups' sums added in group order with Neumaier's (1974)
    /// compensation, so the value does not depend on how the work is cut. (A plain sum of the ten million logs of the
    /// benchmark file in one pass is off by 4.4e-5, 1e-12 of itself, against math.fsum in Python 3.11.)</summary>
    public double SumLog { get; }

    /// <summary>The logs of the groups that may be evaluated row by row.</summary>
    public KeptLogs Kept { get; }

    /// <summary>A vector of <see cref="Lanes"/> per-group values of block b.</summary>
    public static Vector256<double> Block(double[] values, int b) => Vector256.Create(values.AsSpan(b * Lanes, Lanes));

    /// <summary>Size, log-mean, reach and term count of group g from its logs; the logs' sum, and the logs themselves
    /// when the group may be evaluated row by row (<see cref="KeptLogs.Far"/>).</summary>
    private void Describe(int g, ReadOnlySpan<double> cell, double[] sums, double[]?[] far)
    {
        Size[g] = cell.Length;
        if (cell.Length == 0)
        {
            return;
        }

        var centre = Centre[g] = Statistics.Descriptive.Mean(cell);
        var (reach, sum) = (0.0, 0.0);
        foreach (var l in cell)
        {
            reach = Math.Max(reach, Math.Abs(l - centre));
            sum += l;
        }

        (Reach[g], sums[g]) = (reach, sum);
        Terms[g] = GroupedPowerSums.TermsWithin(cell.Length, reach);
        far[g] = KeptLogs.Far(reach) ? cell.ToArray() : null;
    }

    /// <summary>The power sums of blocks <paramref name="firstBlock"/> .. <paramref name="endBlock"/> − 1, one after
    /// another as <see cref="BlockSums"/> reads them, from their logs (<paramref name="logs"/> starts at position <paramref name="from"/>).</summary>
    private double[] Powers(int[] starts, ReadOnlySpan<double> logs, int from, int firstBlock, int endBlock)
    {
        var length = 0;
        for (var b = firstBlock; b < endBlock; b++)
        {
            length += Depth(b) * Lanes;
        }

        var sums = new double[length];
        Span<double> accumulated = stackalloc double[BlockPowers.Scratch];
        var at = 0;
        for (var b = firstBlock; b < endBlock; b++)
        {
            var size = Depth(b) * Lanes;
            BlockPowers.Fill(starts, logs, from, this, b, sums.AsSpan(at, size), accumulated);
            at += size;
        }

        return sums;
    }

    /// <summary>The most terms of a group of block b.</summary>
    private int Depth(int b)
    {
        var depth = 0.0;
        for (var lane = 0; lane < Lanes; lane++)
        {
            depth = Math.Max(depth, Terms[(b * Lanes) + lane]);
        }

        return (int)depth;
    }
}
