namespace CellCheck.IO.Data;

/// <summary>
/// One array per column for a file read in ranges (<see cref="SplitReader"/>), sized to the file's data lines: each
/// range writes from where the lines of the ranges before it end, so joining them moves at most a range down over the
/// unused ends before it, and a column that fills its array is handed over without a copy. At ten million rows that is
/// the 400 MB of chunks a read would otherwise copy into exact arrays, and their page faults.
/// </summary>
internal sealed class ColumnReserve
{
    private readonly int[] _offsets;
    private readonly long[] _lines;

    private ColumnReserve(ColumnMap columns, long[] lines, int length)
    {
        _lines = lines;
        _offsets = new int[lines.Length];
        for (var r = 1; r < lines.Length; r++)
        {
            _offsets[r] = _offsets[r - 1] + (int)lines[r - 1];
        }

        Factors = Array.ConvertAll(columns.Factors, _ => GC.AllocateUninitializedArray<int>(length));
        Responses = Array.ConvertAll(columns.Responses, _ => GC.AllocateUninitializedArray<double>(length));
        RunOrder = columns.RunOrder is null ? null : GC.AllocateUninitializedArray<double>(length);
        Lines = GC.AllocateUninitializedArray<int>(length);
    }

    /// <summary>The reserve for a read cut as <paramref name="plan"/> says, or null when rows are filtered (most lines
    /// might hold no row, so chunks that grow with the rows kept hold less) or the lines are too many for one array.</summary>
    public static ColumnReserve? For(ColumnMap columns, SplitPlan plan, bool filtered)
    {
        var lines = 0L;
        foreach (var count in plan.Lines)
        {
            lines += count;
        }

        return filtered || plan.Lines.Any(l => l < 0) || lines > Array.MaxLength ? null : new ColumnReserve(columns, plan.Lines, (int)lines);
    }

    public int[][] Factors { get; }

    public double[][] Responses { get; }

    public double[]? RunOrder { get; }

    public int[] Lines { get; }

    /// <summary>A buffer writing into one of these arrays, in the part of range <paramref name="range"/>.</summary>
    public ColumnBuffer<T> Buffer<T>(T[] array, int range) => new(array, _offsets[range], (int)_lines[range]);
}
