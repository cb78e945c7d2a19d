using CellCheck.Core.Data;
using CellCheck.Core.Problems;
using CellCheck.IO.Design;

namespace CellCheck.IO.Data;

/// <summary>
/// Reads a delimited text file cut in two ranges (<see cref="SplitPlan"/>) on two threads, and joins the columns in
/// file order: the data are those the one-thread reader gives, value for value. The second range stores its response
/// values relative to the first range's origins, which the first thread hands over as soon as it has them all (or
/// when its range ends); a fault in the first range is reported and the second range's rows are dropped unread.
/// </summary>
internal static class SplitReader
{
    public static LoadResult<DesignData> Read(DesignFile design, CsvRows first, SplitPlan plan)
    {
        var columns = ColumnMap.Resolve(design, first.Header);
        if (columns.Problems.Count > 0)
        {
            return LoadResult<DesignData>.Failure(columns.Problems);
        }

        var origins = new TaskCompletionSource<ResponseOrigin?[]>(TaskCreationOptions.RunContinuationsAsynchronously);
        using var stop = new CancellationTokenSource();
        var reserve = ColumnReserve.For(columns, plan, design.Options.Where.Conditions.Count > 0);
        var second = Task.Run(() => ReadSecond(design, columns, first.Numbers, plan, origins.Task, reserve, stop.Token));
        var head = new ColumnSet(design, columns, first.Numbers, reserve: reserve is null ? null : (reserve, false));
        var whole = false;
        try
        {
            first.StopLine = plan.FirstLine;
            while (first.Next())
            {
                head.Take(first);
                if (!origins.Task.IsCompleted && head.OriginsKnown)
                {
                    origins.SetResult(head.Origins());
                }
            }

            whole = first.Fault is null;
        }
        finally
        {
            origins.TrySetResult(head.Origins());
            if (!whole)
            {
                stop.Cancel();
                ((IAsyncResult)second).AsyncWaitHandle.WaitOne();
            }
        }

        if (first.Fault is { } fault)
        {
            return LoadResult<DesignData>.Failure(fault);
        }

        var (tail, problem) = second.GetAwaiter().GetResult();
        if (problem is not null)
        {
            return LoadResult<DesignData>.Failure(problem);
        }

        head.Append(tail!);
        return RowReader.Finish(design, first, columns, head);
    }

    /// <summary>The second range's columns, or the first problem met in it.</summary>
    private static (ColumnSet? Columns, Problem? Problem) ReadSecond(DesignFile design, ColumnMap columns, NumberSyntax numbers, SplitPlan plan,
        Task<ResponseOrigin?[]> origins, ColumnReserve? reserve, CancellationToken stop)
    {
        CsvRows? rows = null;
        try
        {
            rows = new CsvRows(design.DataPath, new RangeStream(design.DataPath, plan.Header, plan.Start), design.Options.Delimiter, numbers, plan.FirstLine);
            var set = new ColumnSet(design, columns, numbers, origins.GetAwaiter().GetResult(), reserve is null ? null : (reserve, true));
            while (!stop.IsCancellationRequested && rows.Next())
            {
                set.Take(rows);
            }

            return rows.Fault is { } fault ? (null, fault) : (set, null);
        }
        catch (InvalidDataException ex)
        {
            return (null, DataReader.RaggedRow(design, rows?.NextLine ?? plan.FirstLine, ex));
        }
        catch (IOException ex)
        {
            return (null, DataReader.Unreadable(design, ex));
        }
        finally
        {
            rows?.Dispose();
        }
    }
}
