using CellCheck.Core.Analysis;
using CellCheck.Core.Data;
using CellCheck.Core.Order;

namespace CellCheck.Core.Tests.Analysis;

/// <summary>The per-block order checks read each block's residuals in run order, whether the blocks are stretches of
/// the run sequence (read in place) or interleaved (sorted by block first). Reference: the straightforward computation
/// in this file (residuals of each block picked out in run order, d = Σ(e_t − e_{t−1})²/Σe²), common practice, no source.</summary>
public sealed class BlockOrderTests
{
    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public void Each_block_s_Durbin_Watson_d_is_that_of_its_residuals_in_run_order(bool contiguous)
    {
        const int rows = 240;
        var random = new Random(contiguous ? 11 : 12);
        var factor = new int[rows];
        var block = new int[rows];
        var values = new double[rows];
        var order = new double[rows];
        for (var r = 0; r < rows; r++)
        {
            factor[r] = r % 4;
            block[r] = contiguous ? r * 3 / rows : random.Next(3);
            values[r] = factor[r] + block[r] + random.NextDouble();
            order[r] = rows - r; // file in reverse run order
        }

        var data = new DesignData(
            [new FactorColumn("f", ["a", "b", "c", "d"], factor)],
            [new ResponseColumn("y", null, 0, values)],
            Enumerable.Range(2, rows).ToArray(),
            [[]],
            [new FactorColumn("day", ["1", "2", "3"], block)])
        { RunOrder = RunPositions.From(order), RunOrderColumn = "seq" };
        var report = ResponseAnalyzer.Analyze(data, 0, new AnalysisOptions());

        // residuals by data row, from the report's grouped residuals
        var partition = report.Partition!;
        var rowResidual = new double[rows];
        var residuals = report.Rows!.Residuals;
        for (var i = 0; i < partition.RowOrder.Length; i++)
        {
            rowResidual[partition.RowOrder[i]] = residuals[i];
        }

        var runOrder = Enumerable.Range(0, rows).OrderBy(r => order[r]).ToArray();
        foreach (var result in report.Order!.ByBlock)
        {
            var level = Array.IndexOf(new[] { "1", "2", "3" }, result.Block);
            var e = runOrder.Where(r => block[r] == level).Select(r => rowResidual[r]).ToArray();
            Assert.Equal(e.Length, result.Rows);
            Assert.Equal(DurbinWatson.Statistic(e), result.D!.Value, 1e-12);
        }

        Assert.Equal(3, report.Order!.ByBlock.Count);
    }
}
