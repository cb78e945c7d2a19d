using CellCheck.Core.Problems;
using CellCheck.IO.Design;

namespace CellCheck.IO.Data;

/// <summary>
/// The ranges after the first of one split read (<see cref="SplitReader"/>): taken one at a time, in file order, by
/// whichever thread is free, each read into columns of its own. Each range starts from the response origins known
/// after the ranges before it and hands its own on as soon as it knows them all (or when it ends), so every range's
/// values are stored relative to the first usable values in file order, as one reader would store them.
/// </summary>
internal sealed class RangeRun(DesignFile design, ColumnMap columns, NumberSyntax numbers, SplitPlan plan, ColumnReserve? reserve)
{
    private readonly TaskCompletionSource<ResponseOrigin?[]>[] _origins = Enumerable.Range(0, plan.Count)
        .Select(_ => new TaskCompletionSource<ResponseOrigin?[]>(TaskCreationOptions.RunContinuationsAsynchronously)).ToArray();

    private readonly (ColumnSet? Columns, Problem? Problem)[] _results = new (ColumnSet?, Problem?)[plan.Count];
    private int _taken; // the last range taken (the first is the caller's)
    private int _faulty = int.MaxValue; // the earliest range known to hold a problem: the ranges after it are not read

    /// <summary>Hands on the origins known after <paramref name="range"/> (the first call counts).</summary>
    public void HandOn(int range, ResponseOrigin?[] origins) => _origins[range].TrySetResult(origins);

    /// <summary>Notes a problem in <paramref name="range"/>: the ranges after it stop or are not read.</summary>
    public void Fail(int range)
    {
        for (var seen = Volatile.Read(ref _faulty); range < seen; seen = Volatile.Read(ref _faulty))
        {
            if (Interlocked.CompareExchange(ref _faulty, range, seen) == seen)
            {
                return;
            }
        }
    }

    /// <summary>The columns read from <paramref name="range"/> (after <see cref="TakeRanges"/> has ended on every
    /// thread), or its problem; neither when it was not read because a range before it holds a problem.</summary>
    public (ColumnSet? Columns, Problem? Problem) Result(int range) => _results[range];

    /// <summary>Takes the rows of <paramref name="range"/> into <paramref name="set"/>, handing its origins on as soon
    /// as all are known; stops early when a range before it holds a problem.</summary>
    public void Fill(int range, CsvRows rows, ColumnSet set)
    {
        while (range < Volatile.Read(ref _faulty) && rows.Next())
        {
            set.Take(rows);
            if (!_origins[range].Task.IsCompleted && set.OriginsKnown)
            {
                HandOn(range, set.Origins());
            }
        }
    }

    /// <summary>Reads ranges not yet taken until none is left.</summary>
    public void TakeRanges()
    {
        for (var r = Interlocked.Increment(ref _taken); r < plan.Count; r = Interlocked.Increment(ref _taken))
        {
            _results[r] = Read(r);
        }
    }

    private (ColumnSet? Columns, Problem? Problem) Read(int range)
    {
        var inherited = _origins[range - 1].Task.GetAwaiter().GetResult();
        CsvRows? rows = null;
        ColumnSet? set = null;
        try
        {
            if (range > Volatile.Read(ref _faulty))
            {
                return (null, null);
            }

            rows = new CsvRows(design.DataPath, new RangeStream(design.DataPath, plan.Header, plan.Starts[range]), design.Options.Delimiter, numbers,
                plan.FirstLines[range]);
            rows.StopLine = range + 1 < plan.Count ? plan.FirstLines[range + 1] : int.MaxValue;
            set = new ColumnSet(design, columns, numbers, inherited, reserve is null ? null : (reserve, range));
            Fill(range, rows, set);
            if (rows.Fault is { } fault)
            {
                Fail(range);
                return (null, fault);
            }

            return (set, null);
        }
        catch (InvalidDataException ex)
        {
            Fail(range);
            return (null, DataReader.RaggedRow(design, rows?.NextLine ?? plan.FirstLines[range], ex));
        }
        catch (IOException ex)
        {
            Fail(range);
            return (null, DataReader.Unreadable(design, ex));
        }
        finally
        {
            HandOn(range, set?.Origins() ?? inherited);
            rows?.Dispose();
        }
    }
}
