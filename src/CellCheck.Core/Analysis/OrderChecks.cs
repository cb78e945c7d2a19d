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
        var diagnostics = residuals.Diagnostics!;
        var leverage = diagnostics.LeverageOneRows.NotBelowOne == 0 ? null : diagnostics.Leverage;
        // the grouped Durbin-Watson routes read the cell of each residual; the exact one reads the design instead
        var wantsCells = diagnostics.Absorbed is not null || (diagnostics.Estimable is null && partition.RowOrder.Length > ExactLimit);
        var ordered = RunOrdering.Of(order, partition, residuals.Residuals, leverage, wantsCells);
        var (e, t, rows, missing, ties) = (ordered.E, ordered.T, ordered.Rows, ordered.Missing, ordered.Ties);
        if (missing > 0)
        {
            notes.Add(NumberText.Count(missing) + " row(s) have no run position and are left out of the order checks.");
        }

        if (ties > 0)
        {
            notes.Add(NumberText.Count(ties) + " row(s) share a run position with another (run together); within a shared position they keep file order.");
        }

        var checks = new List<CheckResult>();
        // the four parts read the same run-ordered residuals and write only their own results
        DurbinWatsonResult? dw = null;
        List<CheckResult> signAndTrend = null!;
        List<BlockOrderResult> byBlock = null!;
        double? lag1 = null;
        Parallel.Invoke(
            () => dw = DurbinWatsonOf(data, partition, residuals, ordered),
            () => signAndTrend = SignAndTrend(e, t, alpha),
            () => byBlock = data.Blocks.Count == 0 ? [] : BlockOrderChecks.Run(data, rows, e, t, alpha),
            () => lag1 = e.Length > 1 ? LagCorrelation.Lag1(e) : null);
        if (dw is null)
        {
            checks.Add(CheckResults.NotTestable(CheckNames.DurbinWatson, NotTestableReason.TooManyValues));
            notes.Add("The design is too large for Durbin-Watson's exact moments; d is judged by the runs test and trend.");
        }
        else
        {
            checks.Add(dw.IsTestable
                ? new CheckResult(CheckNames.DurbinWatson, dw.D, null, dw.P, null, StatusRules.FromP(dw.P, alpha), null)
                : CheckResults.NotTestable(CheckNames.DurbinWatson, dw.Reason!));
        }

        checks.AddRange(signAndTrend);
        return new OrderResult(data.RunOrderColumn, e.Length, checks, lag1,
            dw?.ExpectedD, dw?.Method, byBlock, notes);
    }

    /// <summary>Durbin-Watson on the residuals in run order: for the cell-means fit above the exact limit, from the
    /// O(n) moments of a group-indicator design; otherwise on the fitted design matrix; null when that is too large.
    /// The cells in run order come written already, or are written over the grouped positions (free by then) instead
    /// of a fresh array; the blocks' contrast columns are narrow codes (a byte a row below 255 levels).</summary>
    private static DurbinWatsonResult? DurbinWatsonOf(DesignData data, CellPartition partition, ResidualSet residuals, RunOrdered ordered)
    {
        var (e, rows) = (ordered.E, ordered.Rows);
        int[] CellRun() => ordered.Cells ?? RunOrderColumns.CellsInRunOrder(partition, ordered.Use!, ordered.Spare ?? throw new InvalidOperationException("rows sorted into run order come with a working array"));
        if (residuals.Diagnostics!.Absorbed is { } absorbed)
        {
            var cellRun = CellRun();
            var dummyRun = new LevelCodes[absorbed.LevelColumns.Length];
            for (var j = 0; j < dummyRun.Length; j++)
            {
                // the fit's contrast column of each block level, looked up by row in run order
                dummyRun[j] = LevelCodes.From(new RunContrasts(data.Blocks[j].Codes, absorbed.LevelColumns[j], rows, e.Length), absorbed.P);
            }

            return CellBlockDurbinWatson.Test(e, cellRun, partition.CellCount, dummyRun, absorbed.P);
        }

        if (residuals.Diagnostics!.Estimable is null && e.Length > ExactLimit)
        {
            return GroupedDurbinWatson.Test(e, CellRun(), partition.CellCount);
        }

        var x = Design(partition, residuals, ordered.Use!);
        return x is null ? null : DurbinWatson.Test(e, x, DurbinWatsonAlternative.Positive, ExactLimit);
    }

    internal static List<CheckResult> SignAndTrend(ReadOnlySpan<double> e, RunPositions t, double alpha)
    {
        var runs = RunsTest.Test(e);
        var trend = OrderTrend.Test(e, t);
        return
        [
            runs.IsTestable
                ? new CheckResult(CheckNames.Runs, runs.Runs, null, runs.P, null, StatusRules.FromP(runs.P, alpha), null)
                : CheckResults.NotTestable(CheckNames.Runs, runs.Reason!),
            trend.IsTestable
                ? new CheckResult(CheckNames.Trend, trend.Slope, [trend.Df], trend.P, null, StatusRules.FromP(trend.P, alpha), null)
                : CheckResults.NotTestable(CheckNames.Trend, trend.Reason!),
        ];
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
