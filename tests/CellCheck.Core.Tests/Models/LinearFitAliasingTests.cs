using CellCheck.Core.Models;
using CellCheck.Core.Tests.Statistics;

namespace CellCheck.Core.Tests.Models;

/// <summary>
/// Rank-deficient designs. Check values from R 4.2.2 with the data below:
/// <code>
/// x1 &lt;- c(1, 2, 3, 4, 5, 6, 7, 8); x2 &lt;- c(2, 1, 4, 3, 6, 5, 8, 9)
/// y &lt;- c(3.1, 4.0, 6.2, 6.9, 9.8, 10.1, 13.5, 15.2)
/// </code>
/// </summary>
public sealed class LinearFitAliasingTests
{
    private static readonly double[] X1 = [1, 2, 3, 4, 5, 6, 7, 8];
    private static readonly double[] X2 = [2, 1, 4, 3, 6, 5, 8, 9];
    private static readonly double[] Y = [3.1, 4.0, 6.2, 6.9, 9.8, 10.1, 13.5, 15.2];

    internal static double[,] Columns(params double[][] columns)
    {
        var design = new double[columns[0].Length, columns.Length];
        for (var i = 0; i < columns[0].Length; i++)
        {
            for (var j = 0; j < columns.Length; j++)
            {
                design[i, j] = columns[j][i];
            }
        }

        return design;
    }

    private static double[] Ones => [.. X1.Select(_ => 1.0)];

    private static double[] Sum => [.. X1.Zip(X2, (a, b) => a + b)];

    /// <summary>R: <c>summary(lm(y ~ x1 + x2))$coefficients</c> (estimates, standard errors) and <c>sigma(...)</c>.</summary>
    private static readonly double[] REstimates = [0.77843137254901862, 1.10686274509803839, 0.59803921568627560];
    private static readonly double[] RErrors = [0.23102166813863492, 0.12619517054475424, 0.10977940902862567];
    private const double RSigma = 0.29631726505323142;

    /// <summary>Relative tolerance against R: the full-rank part is well conditioned (condition number of the
    /// column-scaled [1 x1 x2] about 14, numpy.linalg.cond), so both QR fits are accurate to a few 1e-16; R's own fits of equivalent models (y ~ x1 + x2 against
    /// y ~ x1 + s) differ from each other by 2e-15, and 1e-12 leaves ample room for the order of operations.</summary>
    private const double Tolerance = 1e-12;

    [Fact]
    public void Duplicated_column_is_aliased_and_the_rest_is_the_fit_without_it()
    {
        // R: coef(lm(y ~ x1 + x2 + dup)) with dup <- x1 gives NA for dup and the estimates of lm(y ~ x1 + x2).
        var fit = LinearFit.Fit(Columns(Ones, X1, X2, X1), Y);
        AssertAliasedLast(fit);
    }

    [Fact]
    public void Column_that_is_the_sum_of_two_others_is_aliased_and_the_rest_is_the_fit_without_it()
    {
        // R: coef(lm(y ~ x1 + x2 + s)) with s <- x1 + x2 gives NA for s and the estimates of lm(y ~ x1 + x2).
        var fit = LinearFit.Fit(Columns(Ones, X1, X2, Sum), Y);
        AssertAliasedLast(fit);
    }

    [Fact]
    public void Pivoting_may_alias_another_member_of_a_dependent_set_without_changing_the_fit()
    {
        // With s placed before x1 and x2, R's lm(y ~ s + x1 + x2) (LINPACK dqrdc2, which keeps the given order) gives
        // NA for x2, the last column. Pivoting on norms keeps x1 and x2 and aliases s instead. The column space is
        // the same, so fitted values and leverages are R's (fitted(m), hatvalues(m) below), and the estimable
        // coefficients are those of lm(y ~ x1 + x2).
        double[] rFitted = [3.0813725490196084, 3.5901960784313718, 6.4911764705882362, 7.0000000000000000,
            9.9009803921568622, 10.4098039215686278, 13.3107843137254900, 15.0156862745098039];
        double[] rHat = [0.55392156862745134, 0.43137254901960775, 0.27941176470588203, 0.33333333333333354,
            0.20098039215686261, 0.43137254901960764, 0.31862745098039219, 0.45098039215686281];
        var fit = LinearFit.Fit(Columns(Ones, Sum, X1, X2), Y);
        Assert.Equal([1], fit.Aliased);
        Assert.Equal([0, 2, 3], fit.EstimableColumns);
        Assert.True(double.IsNaN(fit.Coefficients[1]));
        Close.Relative(REstimates[1], fit.Coefficients[2], Tolerance);
        Close.Relative(REstimates[2], fit.Coefficients[3], Tolerance);
        for (var i = 0; i < Y.Length; i++)
        {
            Close.Relative(rFitted[i], fit.Fitted[i], Tolerance);
            Close.Relative(rHat[i], fit.Leverage[i], Tolerance);
        }
    }

    [Fact]
    public void Estimable_design_holds_the_kept_columns_in_their_original_order()
    {
        var x = Columns(Ones, Sum, X1, X2);
        var fit = LinearFit.Fit(x, Y);
        var design = LinearFit.EstimableDesign(x, fit);
        Assert.Equal(Y.Length, design.GetLength(0));
        Assert.Equal(3, design.GetLength(1));
        for (var i = 0; i < Y.Length; i++)
        {
            Assert.Equal([1.0, X1[i], X2[i]], [design[i, 0], design[i, 1], design[i, 2]]);
        }

        var refit = LinearFit.Fit(design, Y);
        Assert.Empty(refit.Aliased);
        Assert.Equal(fit.Residuals, refit.Residuals, (a, b) => Math.Abs(a - b) <= 1e-14);
    }

    [Fact]
    public void Zero_column_is_aliased()
    {
        var fit = LinearFit.Fit(Columns(Ones, X1, new double[8], X2), Y);
        Assert.Equal([2], fit.Aliased);
        Assert.Equal(3, fit.Rank);
        Close.Relative(RSigma, fit.ResidualSd, Tolerance);
    }

    private static void AssertAliasedLast(LinearFitResult fit)
    {
        Assert.Equal([3], fit.Aliased);
        Assert.Equal([0, 1, 2], fit.EstimableColumns);
        Assert.Equal(3, fit.Rank);
        Assert.Equal(5, fit.ResidualDf);
        Assert.True(double.IsNaN(fit.Coefficients[3]));
        Assert.True(double.IsNaN(fit.StandardErrors[3]));
        for (var j = 0; j < 3; j++)
        {
            Close.Relative(REstimates[j], fit.Coefficients[j], Tolerance);
            Close.Relative(RErrors[j], fit.StandardErrors[j], Tolerance);
        }

        Close.Relative(RSigma, fit.ResidualSd, Tolerance);
    }
}
