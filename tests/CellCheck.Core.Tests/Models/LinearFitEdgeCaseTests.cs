using CellCheck.Core.Models;
using CellCheck.Core.Tests.Statistics;
using CellCheck.Core.Tests.Support;

namespace CellCheck.Core.Tests.Models;

public sealed class LinearFitEdgeCaseTests
{
    private static readonly double[] X1 = [1, 2, 3, 4, 5, 6, 7, 8];
    private static readonly double[] Y = [3.1, 4.0, 6.2, 6.9, 9.8, 10.1, 13.5, 15.2];

    private static double[] Ones(int n) => [.. Enumerable.Repeat(1.0, n)];

    [Fact]
    public void Default_rank_tolerance_is_ten_n_epsilon()
    {
        var fit = LinearFit.Fit(LinearFitAliasingTests.Columns(Ones(8), X1), Y);
        Assert.Equal(10 * 8 * Math.Pow(2, -52), fit.RankTolerance);
    }

    [Fact]
    public void As_many_columns_as_rows_fits_exactly_with_no_error_estimate()
    {
        // n = p = 2: the line through two points. No residual degrees of freedom: σ̂, standard errors, studentized
        // residuals and Cook's distances are NaN; both leverages are 1. Coefficients: slope 0.9, intercept 2.2.
        var fit = LinearFit.Fit(LinearFitAliasingTests.Columns(Ones(2), [1, 2]), [3.1, 4.0]);
        Assert.Equal(0, fit.ResidualDf);
        Close.Relative(2.2, fit.Coefficients[0], 1e-14);
        Close.Relative(0.9, fit.Coefficients[1], 1e-14);
        Assert.True(double.IsNaN(fit.ResidualSd));
        Assert.All(fit.StandardErrors, se => Assert.True(double.IsNaN(se)));
        Assert.Equal([1.0, 1.0], fit.Leverage);
        Assert.Equal([0.0, 0.0], fit.Residuals);
        Assert.All(fit.StudentizedInternal.Concat(fit.StudentizedExternal).Concat(fit.CooksDistance), v => Assert.True(double.IsNaN(v)));
    }

    [Fact]
    public void More_columns_than_rows_keeps_at_most_n_of_them()
    {
        var fit = LinearFit.Fit(LinearFitAliasingTests.Columns(Ones(3), [1, 2, 3], [1, 4, 9], [1, 8, 27]), [1.0, 2.5, 2.0]);
        Assert.Equal(3, fit.Rank);
        Assert.Single(fit.Aliased);
        Assert.Equal(0, fit.ResidualDf);
    }

    [Fact]
    public void All_zero_design_aliases_every_column_and_leaves_y_as_the_residual()
    {
        var fit = LinearFit.Fit(new double[3, 2], [1.0, -2.0, 2.0]);
        Assert.Equal(0, fit.Rank);
        Assert.Equal([0, 1], fit.Aliased);
        Assert.Empty(fit.EstimableColumns);
        Assert.Equal([1.0, -2.0, 2.0], fit.Residuals);
        Assert.Equal(9.0, fit.ResidualSumOfSquares);
        Assert.Equal(Math.Sqrt(3.0), fit.ResidualSd);
        Assert.All(fit.Coefficients, c => Assert.True(double.IsNaN(c)));
    }

    [Fact]
    public void One_residual_degree_of_freedom_has_no_external_studentized_residual()
    {
        // df = 1: the deleted-case variance would have 0 degrees of freedom.
        var fit = LinearFit.Fit(LinearFitAliasingTests.Columns(Ones(3), [1, 2, 4]), [1.0, 2.5, 2.0]);
        Assert.Equal(1, fit.ResidualDf);
        Assert.All(fit.StudentizedInternal, v => Assert.False(double.IsNaN(v)));
        Assert.All(fit.StudentizedExternal, v => Assert.True(double.IsNaN(v)));
    }

    [Fact]
    public void A_looser_rank_tolerance_aliases_the_weakest_columns_of_filip()
    {
        // The smallest pivoted |R_kk| of Filip's column-scaled design is about 1e-9 (scipy.linalg.qr with
        // pivoting=True gives 1.02e-9 relative to |R_11|): a tolerance of 1e-7, R's default for lm, must alias at
        // least one column, and the default keeps all eleven.
        var file = NistRegressionFile.Load("Filip");
        var design = LinearFitNistTests.Design(file, "Filip");
        Assert.Equal(11, LinearFit.Fit(design, file.Y).Rank);
        var loose = LinearFit.Fit(design, file.Y, rankTolerance: 1e-7);
        Assert.True(loose.Rank < 11);
        Assert.Equal(11 - loose.Rank, loose.Aliased.Length);
        Assert.All(loose.Aliased, j => Assert.True(double.IsNaN(loose.Coefficients[j])));
    }

    [Fact]
    public void Sizes_that_disagree_or_values_that_are_not_finite_are_programming_errors()
    {
        var x = LinearFitAliasingTests.Columns(Ones(8), X1);
        Assert.Throws<ArgumentException>(() => LinearFit.Fit(x, [1.0, 2.0]));
        Assert.Throws<ArgumentException>(() => LinearFit.Fit(new double[0, 1], []));
        Assert.Throws<ArgumentException>(() => LinearFit.Fit(x, [.. Y[..7], double.NaN]));
        Assert.Throws<ArgumentException>(() => LinearFit.Fit(LinearFitAliasingTests.Columns(Ones(8), [.. X1[..7], double.PositiveInfinity]), Y));
        Assert.Throws<ArgumentException>(() => LinearFit.Fit(x, Y, rankTolerance: -1));
        Assert.Throws<ArgumentException>(() => LinearFit.Fit(x, Y, rankTolerance: 1));
    }
}
