namespace CellCheck.Core.Remedies;

/// <summary>Logs already held in an array (tests and the benchmark's kernels).</summary>
internal sealed class HeldLogs(double[] logs) : ILogSource
{
    public int Count => logs.Length;

    public bool TryFill(int from, Span<double> target)
    {
        logs.AsSpan(from, target.Length).CopyTo(target);
        return true;
    }

    public ArgumentException Failure() => throw new InvalidOperationException("logs that are held are never refused");
}
