namespace CellCheck.Core.Calibration;

/// <summary>
/// What the null distribution of every primary statistic depends on: the sizes of the cells that carry residual
/// information (n ≥ 2), in ascending order. All primary statistics are unchanged by a shift within a cell and by a
/// common change of scale, so under normal errors with equal spread their distribution depends on nothing else.
/// </summary>
public sealed class DesignShape : IEquatable<DesignShape>
{
    public DesignShape(IEnumerable<int> cellSizes)
    {
        ArgumentNullException.ThrowIfNull(cellSizes);
        Sizes = cellSizes.Where(n => n >= 2).Order().ToArray();
        Key = string.Join(",", Sizes.Select(n => n.ToString(System.Globalization.CultureInfo.InvariantCulture)));
    }

    /// <summary>Sizes of the cells with two or more values, ascending.</summary>
    public int[] Sizes { get; }

    /// <summary>A stable text key ("3,3,4,5").</summary>
    public string Key { get; }

    /// <summary>Number of values in the cells with two or more values.</summary>
    public int Count => Sizes.Sum();

    public bool Equals(DesignShape? other) => other is not null && other.Key == Key;

    public override bool Equals(object? obj) => Equals(obj as DesignShape);

    public override int GetHashCode() => Key.GetHashCode(StringComparison.Ordinal);
}
