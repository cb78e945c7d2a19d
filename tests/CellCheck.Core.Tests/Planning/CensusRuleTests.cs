using CellCheck.Core.Cells;
using CellCheck.Core.Planning;

namespace CellCheck.Core.Tests.Planning;

public sealed class CensusRuleTests
{
    private static Census Balanced(int cells, int n) => new(cells, cells, 0, [], n == 1 ? cells : 0, n, n, true, cells * n);

    [Fact]
    public void Six_values_in_every_cell_and_plenty_of_residual_df_are_adequate()
    {
        var v = CensusRule.Judge(Balanced(12, 6), 60);
        Assert.Equal(ReplicationLevel.Adequate, v.Level);
        Assert.Empty(v.Reasons);
        Assert.Contains("Mead 1988", v.Rule, StringComparison.Ordinal);
        Assert.Contains("common practice, no source", v.Rule, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(4, 24)]
    [InlineData(3, 16)]
    [InlineData(2, 8)]
    public void Fewer_than_five_values_per_cell_are_marginal(int n, int residualDf)
    {
        var v = CensusRule.Judge(Balanced(8, n), residualDf);
        Assert.Equal(ReplicationLevel.Marginal, v.Level);
        Assert.Contains(v.Reasons, r => r.Contains("below 5", StringComparison.Ordinal));
    }

    [Fact]
    public void Fewer_than_ten_residual_df_are_marginal_even_with_five_per_cell()
    {
        // two cells of five: 8 residual df, below Mead's (1988) 10
        var v = CensusRule.Judge(Balanced(2, 5), 8);
        Assert.Equal(ReplicationLevel.Marginal, v.Level);
        Assert.Single(v.Reasons);
    }

    [Fact]
    public void Empty_combinations_and_singletons_are_marginal_and_named()
    {
        var census = new Census(5, 6, 1, [["x", "y"]], 1, 1, 8, false, 33);
        var v = CensusRule.Judge(census, 28);
        Assert.Equal(ReplicationLevel.Marginal, v.Level);
        Assert.Contains(v.Reasons, r => r.Contains("have no values", StringComparison.Ordinal));
        Assert.Contains(v.Reasons, r => r.Contains("single value", StringComparison.Ordinal));
    }

    [Fact]
    public void One_value_per_cell_or_no_residual_df_is_unreplicated()
    {
        Assert.Equal(ReplicationLevel.Unreplicated, CensusRule.Judge(Balanced(8, 1), 0).Level);
        Assert.Equal(ReplicationLevel.Unreplicated, CensusRule.Judge(Balanced(4, 2), 0).Level);
    }
}
