namespace CellCheck.Core.Analysis;

/// <summary>
/// Hands the working copies of a finished step back to the garbage collector on large data. Each check on millions
/// of rows allocates arrays of tens of megabytes; left to itself the collector grows the heap with every check's
/// copies instead of reusing the memory of those already finished, and every fresh page costs a page fault. A full
/// (non-compacting) collection after each large step costs a few milliseconds here, since the heap holds few objects.
/// Measured on ten million rows: peak memory 3.5 → 2.7 GB and about a tenth less time (bench/README.md).
/// </summary>
internal static class WorkingMemory
{
    /// <summary>Steps over more rows than this release their working copies when they finish.</summary>
    public const int ReleaseRows = 1_000_000;

    public static void Release(int rows)
    {
        if (rows > ReleaseRows)
        {
            GC.Collect(GC.MaxGeneration, GCCollectionMode.Forced, blocking: true, compacting: false);
        }
    }
}
