using CellCheck.Core.Cells;

namespace CellCheck.Core.Data;

/// <summary>
/// A numeric response held columnar. Values are stored relative to <see cref="Origin"/> (the reader subtracts an
/// exact decimal origin before converting to double, so data with many constant leading digits keep their
/// precision); every check is location invariant, and reported means add the origin back.
/// A row without a usable value holds NaN and has an entry in the exclusion list of the data set.
/// </summary>
/// <remarks>The values are held once: in file order until the column is first split into cells
/// (<see cref="PartitionBy"/>), then grouped by cell in that partition, which every check reads (at ten million rows the
/// file-order copy would be 80 MB held beside it to the end). <see cref="Values"/> gives the same doubles either way.</remarks>
public sealed class ResponseColumn
{
    private readonly Lock _gate = new();
    private double[]? _values; // file order, until a partition takes them over
    private CellPartition? _holder; // the partition that holds them grouped, once it has
    private (int Row, double Value)[] _outside = []; // values of rows the holder leaves out (no level on a block)

    public ResponseColumn(string name, string? unit, double origin, double[] values)
    {
        ArgumentNullException.ThrowIfNull(name);
        ArgumentNullException.ThrowIfNull(values);
        Name = name;
        Unit = unit;
        Origin = origin;
        _values = values;
        Length = values.Length;
    }

    /// <summary>Display name of the response.</summary>
    public string Name { get; }

    /// <summary>Unit of measurement, when declared.</summary>
    public string? Unit { get; }

    /// <summary>The value every stored value is relative to.</summary>
    public double Origin { get; }

    /// <summary>Number of rows.</summary>
    public int Length { get; }

    /// <summary>Value minus <see cref="Origin"/> per row, in file order; NaN where the row is excluded for this response.
    /// Once the column has been split into cells this writes a new array on each call (read it once).</summary>
    public double[] Values
    {
        get
        {
            lock (_gate)
            {
                return _values ?? FileOrder(_holder!, _outside, Length);
            }
        }
    }

    /// <summary>The most decimal places written in any value (null when unknown, e.g. exponent notation): the
    /// finest step the values can have been recorded to.</summary>
    public int? Decimals { get; init; }

    /// <summary>The rows split into the cells of <paramref name="factors"/> with additive <paramref name="blocks"/>
    /// (<see cref="CellPartition.Build"/>). The first split takes the values over, so that they are held only grouped
    /// from then on; a later call with the same factor and block columns returns that partition.</summary>
    public CellPartition PartitionBy(IReadOnlyList<FactorColumn> factors, IReadOnlyList<FactorColumn> blocks)
    {
        ArgumentNullException.ThrowIfNull(factors);
        ArgumentNullException.ThrowIfNull(blocks);
        lock (_gate)
        {
            if (_holder is { } held && Same(held.Factors, factors) && Same(held.Blocks, blocks))
            {
                return held;
            }

            var values = _values ?? FileOrder(_holder!, _outside, Length);
            var partition = CellPartition.Build(factors, values, blocks);
            if (_values is not null)
            {
                _outside = Outside(partition, values);
                (_holder, _values) = (partition, null);
            }

            return partition;
        }
    }

    private static bool Same(IReadOnlyList<FactorColumn> a, IReadOnlyList<FactorColumn> b) =>
        a.Count == b.Count && a.Zip(b).All(pair => ReferenceEquals(pair.First, pair.Second));

    /// <summary>The rows with a value that <paramref name="partition"/> leaves out (a row without a level on a factor
    /// or block), with their values; none in the usual case, where every row with a value is in a cell.</summary>
    private static (int Row, double Value)[] Outside(CellPartition partition, double[] values)
    {
        var withValue = 0;
        foreach (var v in values)
        {
            withValue += double.IsNaN(v) ? 0 : 1;
        }

        if (withValue == partition.RowOrder.Length)
        {
            return [];
        }

        var inside = new bool[values.Length];
        foreach (var row in partition.RowOrder)
        {
            inside[row] = true;
        }

        return [.. Enumerable.Range(0, values.Length).Where(row => !inside[row] && !double.IsNaN(values[row])).Select(row => (row, values[row]))];
    }

    private static double[] FileOrder(CellPartition holder, (int Row, double Value)[] outside, int length)
    {
        var values = GC.AllocateUninitializedArray<double>(length);
        Array.Fill(values, double.NaN);
        var (rows, grouped) = (holder.RowOrder, holder.Values.Values);
        for (var i = 0; i < rows.Length; i++)
        {
            values[rows[i]] = grouped[i];
        }

        foreach (var (row, value) in outside)
        {
            values[row] = value;
        }

        return values;
    }
}
