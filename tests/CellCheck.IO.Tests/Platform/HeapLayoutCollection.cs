namespace CellCheck.IO.Tests.Platform;

/// <summary>Tests that look at where the runtime puts the heap run alone: other tests allocating and collecting at the
/// same time move and decommit heap regions between the advice and the look.</summary>
[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class HeapLayoutCollection
{
    public const string Name = "Heap layout";
}
