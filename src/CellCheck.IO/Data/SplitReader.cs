using CellCheck.Core.Data;
using CellCheck.IO.Design;

namespace CellCheck.IO.Data;

/// <summary>
/// Reads a delimited text file cut in ranges (<see cref="SplitPlan"/>) on several threads, and joins the columns in
/// file order: the data are those the one-thread reader gives, value for value. The calling thread reads the first
/// range and then, like each helper thread, takes the next range not yet taken (<see cref="RangeRun"/>), so a thread
/// slowed by other work reads fewer ranges. The first problem in file order is reported.
/// </summary>
internal static class SplitReader
{
    /// <param name="threads">Threads that read, the calling one included (no more than the ranges).</param>
    public static LoadResult<DesignData> Read(DesignFile design, CsvRows first, SplitPlan plan, int threads)
    {
        var columns = ColumnMap.Resolve(design, first.Header);
        if (columns.Problems.Count > 0)
        {
            return LoadResult<DesignData>.Failure(columns.Problems);
        }

        var reserve = ColumnReserve.For(columns, plan, design.Options.Where.Conditions.Count > 0);
        var run = new RangeRun(design, columns, first.Numbers, plan, reserve);
        var helpers = new Task[Math.Clamp(threads - 1, 0, plan.Count - 1)];
        for (var h = 0; h < helpers.Length; h++)
        {
            helpers[h] = Task.Run(run.TakeRanges);
        }

        var head = new ColumnSet(design, columns, first.Numbers, reserve: reserve is null ? null : (reserve, 0));
        try
        {
            first.StopLine = plan.FirstLines[1];
            run.Fill(0, first, head);

            if (first.Fault is not null)
            {
                run.Fail(0);
            }
        }
        catch
        {
            // the exception is the problem reported: the other ranges stop, and end before it leaves
            run.Fail(0);
            run.HandOn(0, head.Origins());
            Task.WaitAll(helpers);
            throw;
        }

        run.HandOn(0, head.Origins());
        run.TakeRanges();
        Task.WaitAll(helpers);
        if (first.Fault is { } fault)
        {
            return LoadResult<DesignData>.Failure(fault);
        }

        for (var r = 1; r < plan.Count; r++)
        {
            var (set, problem) = run.Result(r);
            if (problem is not null)
            {
                return LoadResult<DesignData>.Failure(problem);
            }

            head.Append(set!);
        }

        return RowReader.Finish(design, first, columns, head);
    }
}
