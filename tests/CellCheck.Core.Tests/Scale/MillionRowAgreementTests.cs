using CellCheck.Core.Analysis;
using Xunit.Abstractions;

namespace CellCheck.Core.Tests.Scale;

/// <summary>
/// Large-input correctness: on 1 000 000 seeded rows in 1 000 cells of unequal size (<see cref="ScaleDesign.ThousandCells"/>),
/// every statistic of CellCheck's report equals the one computed by the straightforward reference in this folder (plain
/// loops, textbook formulas, compensated sums, no production code) to <see cref="Agreement.Tolerance"/> relative, whose
/// reason is written on <see cref="Agreement"/>. Each test writes the differences it saw to the test output.
/// </summary>
public sealed class MillionRowAgreementTests(MillionRowFixture fixture, ITestOutputHelper output) : IClassFixture<MillionRowFixture>
{
    private readonly ReportAgreement _compare = new(fixture.Design, fixture.Report, fixture.Reference, new Agreement(output));

    private ReferenceCells Reference => fixture.Reference;

    [Fact]
    public void Cells_of_a_million_rows_have_the_sizes_means_and_shapes_of_the_straightforward_sums() => _compare.CellSizesMeansAndShapes();

    [Fact]
    public void Residuals_of_a_million_rows_are_value_minus_the_careful_cell_mean() => _compare.Residuals();

    [Fact]
    public void Levene_on_a_million_rows_equals_the_straightforward_formula() =>
        _compare.Spread(CheckNames.Levene, ReferenceSpread.Levene(Reference.Replicated));

    [Fact]
    public void Brown_forsythe_on_a_million_rows_equals_the_straightforward_formula() =>
        _compare.Spread(CheckNames.BrownForsythe, ReferenceSpread.BrownForsythe(Reference.Replicated));

    [Fact]
    public void Brown_forsythe_with_structural_zeros_removed_on_a_million_rows_equals_the_straightforward_formula() =>
        _compare.Spread(CheckNames.BrownForsytheZerosRemoved, ReferenceSpread.BrownForsytheZerosRemoved(Reference.Replicated));

    [Fact]
    public void Bartlett_on_a_million_rows_equals_the_straightforward_formula() =>
        _compare.Spread(CheckNames.Bartlett, ReferenceSpread.Bartlett(Reference.Replicated));

    [Fact]
    public void Fligner_killeen_on_a_million_rows_ranks_ties_and_scores_as_the_straightforward_formula() =>
        _compare.Spread(CheckNames.FlignerKilleen, ReferenceFligner.Test(Reference.Replicated));

    [Fact]
    public void The_sd_ratio_of_a_million_rows_is_that_of_the_reference_cells() => _compare.SdRatio();

    [Fact]
    public void One_way_anova_f_on_a_million_rows_equals_the_straightforward_sums() => _compare.OneWayAnovaF();

    [Fact]
    public void Pooled_skewness_and_kurtosis_of_a_million_studentized_residuals_equal_the_compensated_moments() => _compare.PooledMoments();

    [Fact]
    public void Pooled_shapiro_wilk_w_of_a_million_residuals_equals_royston_written_from_the_papers() => _compare.PooledShapiroWilk();

    /// <summary>A² = −n − S/n is a difference of two numbers near 10⁶ here, and Stephens' p multiplies A²'s relative error
    /// by about 190 at A* ≈ 105 (d ln p / d ln A* = −5.709A* + 0.0372A*²): the most demanding comparison of the set.</summary>
    [Fact]
    public void Pooled_anderson_darling_of_a_million_residuals_equals_the_textbook_sum() => _compare.PooledAndersonDarling();

    [Fact]
    public void Pooled_dagostino_pearson_of_a_million_residuals_equals_the_published_transforms() => _compare.PooledDagostinoPearson();

    [Fact]
    public void Durbin_watson_d_and_lag_one_correlation_in_run_order_equal_the_straightforward_sums() => _compare.DurbinWatsonAndLag1();

    [Fact]
    public void Runs_test_in_run_order_counts_the_same_runs_and_gives_the_same_p() => _compare.Runs();

    [Fact]
    public void Trend_over_run_order_has_the_slope_and_p_of_the_straightforward_regression() => _compare.Trend();

    [Fact]
    public void Shapiro_wilk_in_every_cell_equals_royston_written_from_the_papers() =>
        _compare.EveryCell(CheckNames.ShapiroWilk, 3, ReferenceShapiroWilk.Test);

    [Fact]
    public void Anderson_darling_in_every_cell_equals_the_textbook_sum() =>
        _compare.EveryCell(CheckNames.AndersonDarling, 8, ReferenceAndersonDarling.Test);
}
