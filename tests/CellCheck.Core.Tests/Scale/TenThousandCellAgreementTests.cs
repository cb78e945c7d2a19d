using CellCheck.Core.Analysis;
using Xunit.Abstractions;

namespace CellCheck.Core.Tests.Scale;

/// <summary>
/// Large-input correctness with many small cells: 1 000 000 seeded rows in 10 000 cells of 100 rows
/// (<see cref="ScaleDesign.TenThousandCells"/>), every statistic against the straightforward reference to
/// <see cref="Agreement.Tolerance"/> relative (reason on <see cref="Agreement"/>).
/// </summary>
public sealed class TenThousandCellAgreementTests(ITestOutputHelper output)
{
    [Fact]
    public void Every_statistic_at_ten_thousand_cells_of_one_hundred_rows_equals_the_straightforward_reference()
    {
        var design = ScaleDesign.TenThousandCells();
        var report = ResponseAnalyzer.Analyze(design.Data, 0, new AnalysisOptions());
        var reference = ReferenceCells.From(design);
        var compare = new ReportAgreement(design, report, reference, new Agreement(output));

        Assert.Equal(10_000, report.Cells.Count);
        Assert.All(report.Cells, c => Assert.Equal(100, c.N));
        compare.CellSizesMeansAndShapes();
        compare.Residuals();
        compare.Spread(CheckNames.Levene, ReferenceSpread.Levene(reference.Replicated));
        compare.Spread(CheckNames.BrownForsythe, ReferenceSpread.BrownForsythe(reference.Replicated));
        compare.Spread(CheckNames.BrownForsytheZerosRemoved, ReferenceSpread.BrownForsytheZerosRemoved(reference.Replicated));
        compare.Spread(CheckNames.Bartlett, ReferenceSpread.Bartlett(reference.Replicated));
        compare.Spread(CheckNames.FlignerKilleen, ReferenceFligner.Test(reference.Replicated));
        compare.SdRatio();
        compare.OneWayAnovaF();
        compare.PooledMoments();
        compare.PooledShapiroWilk();
        compare.PooledAndersonDarling();
        compare.PooledDagostinoPearson();
        compare.DurbinWatsonAndLag1();
        compare.Runs();
        compare.Trend();
        compare.EveryCell(CheckNames.ShapiroWilk, 3, ReferenceShapiroWilk.Test);
        compare.EveryCell(CheckNames.AndersonDarling, 8, ReferenceAndersonDarling.Test);
    }
}
