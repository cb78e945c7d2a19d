namespace CellCheck.Core.Data;

/// <summary>
/// A numeric response held columnar. Values are stored relative to <see cref="Origin"/> (the reader subtracts an
/// exact decimal origin before converting to double, so data with many constant leading digits keep their
/// precision); every check is location invariant, and reported means add the origin back.
/// A row without a usable value holds NaN and has an entry in the exclusion list of the data set.
/// </summary>
public sealed class ResponseColumn
{
    public ResponseColumn(string name, string? unit, double origin, double[] values)
    {
        ArgumentNullException.ThrowIfNull(name);
        ArgumentNullException.ThrowIfNull(values);
        Name = name;
        Unit = unit;
        Origin = origin;
        Values = values;
    }

    /// <summary>Display name of the response.</summary>
    public string Name { get; }

    /// <summary>Unit of measurement, when declared.</summary>
    public string? Unit { get; }

    /// <summary>The value every stored value is relative to.</summary>
    public double Origin { get; }

    /// <summary>Value minus <see cref="Origin"/> per row; NaN where the row is excluded for this response.</summary>
    public double[] Values { get; }

    /// <summary>The most decimal places written in any value (null when unknown, e.g. exponent notation): the
    /// finest step the values can have been recorded to.</summary>
    public int? Decimals { get; init; }
}
