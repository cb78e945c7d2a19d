using CellCheck.Core.Cells;
using CellCheck.Core.Data;
using CellCheck.Core.Models;
using CellCheck.Core.Order;
using CellCheck.Core.Residuals;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Analysis;

/// <summary>Runs the independence checks on model residuals sorted by the declared run order.</summary>
internal static class OrderChecks
{
    /// <summary>Largest n for the exact Durbin-Watson p (eigenvalues of an n × n matrix: about a second at 1000).</summary>
    public const int ExactLimit = 1000;

    /// <summary>Above this n·p² the design matrix is too large for the Durbin-Watson moments.</summary>
    public const double MomentWorkLimit = 4e9;

    public static OrderResult Run(DesignData data, CellPartition partition, ResidualSet residuals, double alpha)
    {
        if (data.RunOrder is not { } order)
        {
            return OrderResult.NotDeclared;
        }

        var notes = new List<string>();
        var leverage = residuals.Diagnostics!.Leverage;
        var use = Enumerable.Range(0, partition.RowOrder.Length)
            .Where(i => !double.IsNaN(order[partition.RowOrder[i]]) && leverage[i] < 1 - 1e-10)
            .OrderBy(i => order[partition.RowOrder[i]]).ThenBy(i => partition.RowOrder[i]).ToArray();
        var missing = partition.RowOrder.Count(r => double.IsNaN(order[r]));
        if (missing > 0)
        {
            notes.Add(NumberText.Count(missing) + " row(s) have no run position and are left out of the order checks.");
        }

        var t = use.Select(i => order[partition.RowOrder[i]]).ToArray();
        var ties = t.Length - t.Distinct().Count();
        if (ties > 0)
        {
            notes.Add(NumberText.Count(ties) + " row(s) share a run position with another (run together); within a shared position they keep file order.");
        }

        var e = use.Select(i => residuals.Residuals[i]).ToArray();
        var checks = new List<CheckResult>();
        var x = Design(partition, residuals, use);
        DurbinWatsonResult? dw = null;
        if (x is null)
        {
            checks.Add(CheckResults.NotTestable(CheckNames.DurbinWatson, NotTestableReason.TooManyValues));
            notes.Add("The design is too large for Durbin-Watson's exact moments; d is judged by the runs test and trend.");
        }
        else
        {
            dw = DurbinWatson.Test(e, x, DurbinWatsonAlternative.Positive, ExactLimit);
            checks.Add(dw.IsTestable
                ? new CheckResult(CheckNames.DurbinWatson, dw.D, null, dw.P, null, StatusRules.FromP(dw.P, alpha), null)
                : CheckResults.NotTestable(CheckNames.DurbinWatson, dw.Reason!));
        }

        checks.AddRange(SignAndTrend(e, t, alpha));
        var byBlock = data.Blocks.Count == 0 ? [] : ByBlock(data, partition, use, e, t, alpha);
        return new OrderResult(data.RunOrderColumn, e.Length, checks, e.Length > 1 ? LagCorrelation.Lag1(e) : null,
            dw?.ExpectedD, dw?.Method, byBlock, notes);
    }

    private static IEnumerable<CheckResult> SignAndTrend(double[] e, double[] t, double alpha)
    {
        var runs = RunsTest.Test(e);
        yield return runs.IsTestable
            ? new CheckResult(CheckNames.Runs, runs.Runs, null, runs.P, null, StatusRules.FromP(runs.P, alpha), null)
            : CheckResults.NotTestable(CheckNames.Runs, runs.Reason!);
        var trend = OrderTrend.Test(e, t);
        yield return trend.IsTestable
            ? new CheckResult(CheckNames.Trend, trend.Slope, [trend.Df], trend.P, null, StatusRules.FromP(trend.P, alpha), null)
            : CheckResults.NotTestable(CheckNames.Trend, trend.Reason!);
    }

    private static List<BlockOrderResult> ByBlock(DesignData data, CellPartition partition, int[] use, double[] e, double[] t, double alpha)
    {
        var result = new List<BlockOrderResult>();
        var block = data.Blocks[0];
        for (var level = 0; level < block.Levels.Count; level++)
        {
            var idx = Enumerable.Range(0, use.Length).Where(k => block.Codes[partition.RowOrder[use[k]]] == level).ToArray();
            if (idx.Length == 0)
            {
                continue;
            }

            var eb = idx.Select(k => e[k]).ToArray();
            var tb = idx.Select(k => t[k]).ToArray();
            result.Add(new BlockOrderResult(block.Levels[level], eb.Length, eb.Length > 1 ? DurbinWatson.Statistic(eb) : null,
                eb.Length > 1 ? LagCorrelation.Lag1(eb) : null, SignAndTrend(eb, tb, alpha).ToList()));
        }

        return result;
    }

    /// <summary>The fitted model's full-rank design matrix for the used rows in run order (cell indicators for the cell-means fit).</summary>
    private static double[,]? Design(CellPartition partition, ResidualSet residuals, int[] use)
    {
        var source = residuals.Diagnostics!.Estimable;
        var p = source?.GetLength(1) ?? partition.CellCount;
        if ((double)use.Length * p * p > MomentWorkLimit)
        {
            return null;
        }

        var cellOf = new int[partition.RowOrder.Length];
        for (var c = 0; c < partition.CellCount; c++)
        {
            Array.Fill(cellOf, c, partition.Values.Starts[c], partition.Size(c));
        }

        var x = new double[use.Length, p];
        for (var k = 0; k < use.Length; k++)
        {
            for (var j = 0; j < p; j++)
            {
                x[k, j] = source is not null ? source[use[k], j] : (cellOf[use[k]] == j ? 1.0 : 0.0);
            }
        }

        var kept = OrderedRank.KeptColumns(x);
        return kept.Length == p ? x : MatrixColumns.Select(x, kept);
    }
}
