namespace CellCheck.IO.Data;

/// <summary>
/// One array per column for a file read in two ranges (<see cref="SplitReader"/>), sized to the file's data lines:
/// the first range writes from the start, the second after the first range's lines, so joining them moves at most the
/// second range down over the first's unused end, and a column that fills its array is handed over without a copy.
/// At ten million rows that is the 400 MB of chunks a read would otherwise copy into exact arrays, and their page faults.
/// </summary>
internal sealed class ColumnReserve
{
    private readonly int _firstLines;
    private readonly int _secondLines;

    private ColumnReserve(ColumnMap columns, int firstLines, int secondLines)
    {
        (_firstLines, _secondLines) = (firstLines, secondLines);
        var length = firstLines + secondLines;
        Factors = Array.ConvertAll(columns.Factors, _ => GC.AllocateUninitializedArray<int>(length));
        Responses = Array.ConvertAll(columns.Responses, _ => GC.AllocateUninitializedArray<double>(length));
        RunOrder = columns.RunOrder is null ? null : GC.AllocateUninitializedArray<double>(length);
        Lines = GC.AllocateUninitializedArray<int>(length);
    }

    /// <summary>The reserve for a read cut as <paramref name="plan"/> says, or null when rows are filtered (most lines
    /// might hold no row, so chunks that grow with the rows kept hold less) or the lines are too many for one array.</summary>
    public static ColumnReserve? For(ColumnMap columns, SplitPlan plan, bool filtered)
    {
        var lines = (long)plan.FirstLines + plan.SecondLines;
        return filtered || plan.FirstLines < 0 || lines > Array.MaxLength ? null : new ColumnReserve(columns, plan.FirstLines, (int)plan.SecondLines);
    }

    public int[][] Factors { get; }

    public double[][] Responses { get; }

    public double[]? RunOrder { get; }

    public int[] Lines { get; }

    /// <summary>A buffer writing into one of these arrays, in the part of the first or the second range.</summary>
    public ColumnBuffer<T> Buffer<T>(T[] array, bool second) =>
        second ? new ColumnBuffer<T>(array, _firstLines, _secondLines) : new ColumnBuffer<T>(array, 0, _firstLines);
}
