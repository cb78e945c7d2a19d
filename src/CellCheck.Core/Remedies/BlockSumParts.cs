namespace CellCheck.Core.Remedies;

/// <summary>
/// The power sums of a <see cref="PowerSumTable"/> as its work items formed them: each item's blocks one after another
/// in an array of the item's own, read in place (no copy into one array of every block).
/// </summary>
internal sealed class BlockSumParts
{
    private readonly double[][] parts;
    private readonly int[] partOf;
    private readonly int[] at;
    private readonly int[] length;

    /// <param name="parts">The sums of work item i: blocks cuts[i] .. cuts[i + 1] − 1, one after another.</param>
    /// <param name="cuts">The first block of each work item, then the number of blocks.</param>
    /// <param name="size">The number of sums of block b.</param>
    public BlockSumParts(double[][] parts, List<int> cuts, Func<int, int> size)
    {
        this.parts = parts;
        var blocks = cuts[^1];
        (partOf, at, length) = (new int[blocks], new int[blocks], new int[blocks]);
        for (var i = 0; i < parts.Length; i++)
        {
            Stored += parts[i].Length;
            for (int b = cuts[i], next = 0; b < cuts[i + 1]; b++)
            {
                (partOf[b], at[b], length[b]) = (i, next, size(b));
                next += length[b];
            }
        }
    }

    /// <summary>Number of sums stored.</summary>
    public int Stored { get; }

    /// <summary>The sums of block b.</summary>
    public ReadOnlySpan<double> Of(int b) => parts[partOf[b]].AsSpan(at[b], length[b]);

    /// <summary>Work items of whole blocks of <paramref name="lanes"/> groups, each closed once it holds at least
    /// <paramref name="rows"/> rows: the first block of each item, then the number of blocks.</summary>
    /// <param name="starts">Group g holds positions starts[g] .. starts[g + 1] − 1.</param>
    public static List<int> Cut(int[] starts, int lanes, int rows)
    {
        var groups = starts.Length - 1;
        var blocks = (groups + lanes - 1) / lanes;
        var cuts = new List<int> { 0 };
        for (var b = 0; b < blocks; b++)
        {
            var end = Math.Min(groups, (b + 1) * lanes);
            if (b + 1 == blocks || starts[end] - starts[cuts[^1] * lanes] >= rows)
            {
                cuts.Add(b + 1);
            }
        }

        return cuts;
    }
}
