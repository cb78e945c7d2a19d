using CellCheck.Core.Planning;
using CellCheck.Core.Statistics;
using CellCheck.Core.Tests.Analysis;

namespace CellCheck.Core.Tests.Planning;

public sealed class ReplicatesAssessorTests
{
    [Fact]
    public void An_unreplicated_response_is_judged_so_and_its_checks_are_not_simulated()
    {
        var r = SizeRuleTests.Analyze([0, 1, 2, 3], [1, 4, 2, 8], 4).Replicates!;
        Assert.Equal(ReplicationLevel.Unreplicated, r.Census.Level);
        Assert.Equal(0, r.Sensitivity.Draws);
        Assert.All(r.Sensitivity.Rows, row => Assert.Equal(NotTestableReason.NoResidualDegreesOfFreedom, row.Reason));
        Assert.NotNull(r.Sensitivity.Note);
    }

    [Fact]
    public void A_replicated_response_gets_a_sensitivity_row_for_every_check_and_plain_words()
    {
        var cells = Enumerable.Range(0, 18).Select(i => i / 6).ToArray();
        var values = Enumerable.Range(0, 18).Select(i => Math.Sin(i * 1.7) + (i / 6)).ToArray();
        var r = SizeRuleTests.Analyze(cells, values, 3).Replicates!;
        Assert.Equal(ReplicationLevel.Adequate, r.Census.Level);
        Assert.Equal(15, r.ResidualDf);
        Assert.Equal(SensitivityChecks.All.Count, r.Sensitivity.Rows.Count);
        Assert.Equal(400, r.Sensitivity.Draws);
        Assert.StartsWith("Census verdict adequate (6 value(s) per cell, 15 residual df)", r.Summary[0], StringComparison.Ordinal);
        Assert.Contains(r.Summary, s => s.Contains("a lognormal cell", StringComparison.Ordinal));
        Assert.Contains(r.Summary, s => s.Contains("a 4:1 variance ratio", StringComparison.Ordinal));
    }
}
