namespace CellCheck.Core.Residuals;

/// <summary>
/// A per-row column of a residual set: given (and kept), or formed on first use and then kept. A step that reads it
/// once may instead take it without keeping it (<see cref="Once"/>), so a large check that writes no per-row output
/// never holds it.
/// </summary>
internal sealed class OnDemandColumn
{
    private readonly Func<double[]>? _source;
    private double[]? _kept;
    private object? _gate;

    public OnDemandColumn(double[] given) => _kept = given;

    public OnDemandColumn(Func<double[]> source) => _source = source;

    /// <summary>True when the column has been formed and kept (or was given).</summary>
    public bool IsKept => Volatile.Read(ref _kept) is not null;

    /// <summary>The column, formed once on first use and kept.</summary>
    public double[] Value => Volatile.Read(ref _kept) ?? LazyInitializer.EnsureInitialized(ref _kept, ref _gate, _source!);

    /// <summary>The column for one reading: the kept one if there is one (<paramref name="owned"/> false: do not write
    /// to it), else a freshly formed array that is not kept and the caller may overwrite.</summary>
    public double[] Once(out bool owned)
    {
        var kept = Volatile.Read(ref _kept);
        owned = kept is null;
        return kept ?? _source!();
    }
}
