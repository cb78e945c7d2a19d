using CellCheck.Core.Cells;
using CellCheck.Core.Residuals;
using CellCheck.Core.Tests.Cells;

namespace CellCheck.Core.Tests.Residuals;

public sealed class CellMeansResidualsTests
{
    [Fact]
    public void Residuals_are_value_minus_cell_mean_and_studentized_by_the_pooled_sd()
    {
        // cells {1, 2, 3} and {10, 14}: residuals -1, 0, 1 and -2, 2; SS = 2 + 8 = 10 on 5 - 2 = 3 df (hand computation).
        var a = CellPartitionTests.Factor("a", ["p", "q"], 0, 0, 0, 1, 1);
        var set = new CellMeansResiduals().Compute(CellPartition.Build([a], [1, 2, 3, 10, 14]));
        Assert.Equal([-1.0, 0, 1, -2, 2], set.Residuals);
        Assert.Equal(3, set.ResidualDf);
        var s = Math.Sqrt(10.0 / 3);
        Assert.Equal(Math.Sqrt(10.0 / 3), set.ResidualSd, 1e-14);
        Assert.Equal(-1 / (s * Math.Sqrt(2.0 / 3)), set.Studentized[0], 1e-14);
        Assert.Equal(2 / (s * Math.Sqrt(0.5)), set.Studentized[4], 1e-14);
    }

    [Fact]
    public void A_singleton_cell_has_a_zero_residual_and_no_studentized_residual()
    {
        var a = CellPartitionTests.Factor("a", ["p", "q"], 0, 0, 1);
        var set = new CellMeansResiduals().Compute(CellPartition.Build([a], [1, 3, 7]));
        Assert.Equal(0.0, set.Residuals[2]);
        Assert.True(double.IsNaN(set.Studentized[2]));
        Assert.Equal(1, set.ResidualDf);
    }
}
