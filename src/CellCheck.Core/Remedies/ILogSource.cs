namespace CellCheck.Core.Remedies;

/// <summary>log y in a grouped order, written range by range (<see cref="PowerSumTable"/>), so that the Box-Cox power
/// sums are formed without an array of the data's length (80 MB at ten million rows).</summary>
internal interface ILogSource
{
    /// <summary>Number of positions.</summary>
    int Count { get; }

    /// <summary>Writes log y at positions <paramref name="from"/> .. <paramref name="from"/> + target.Length − 1;
    /// false when a value there is not positive and finite (the target is then partly written).</summary>
    bool TryFill(int from, Span<double> target);

    /// <summary>The error naming the first value, in this order, that is not positive and finite.</summary>
    ArgumentException Failure();
}
