using System.Globalization;
using CellCheck.Core.Models;
using CellCheck.Core.Tests.Statistics;

namespace CellCheck.Core.Tests.Models;

/// <summary>
/// A row that is alone at its level of a factor is fitted exactly by its own dummy column: leverage 1, residual 0, and
/// no studentized residual or Cook's distance (they divide by 1 − h = 0). R 4.2.2 agrees:
/// <code>
/// d &lt;- rbind(po, data.frame(time = 0.5, poison = 4, treat = "A")); m &lt;- lm(time ~ factor(poison) + treat, data = d)
/// hatvalues(m)[49]        # 1
/// rstandard(m)[49]; rstudent(m)[49]; cooks.distance(m)[49]   # NaN NaN NaN
/// sigma(m)                # 0.15817880930859771, the same as without row 49
/// </code>
/// (R's residual there is 1.04e-17, rounding; this fit reports exactly 0.)
/// </summary>
public sealed class LinearFitLeverageOneTests
{
    [Fact]
    public void Row_alone_at_its_level_has_leverage_one_zero_residual_and_no_studentized_residual()
    {
        var data = PoisonsDesign.Load().With(0.5, "4", "A");
        var fit = LinearFit.Fit(data.Design(), data.Time);
        Assert.Equal(7, fit.Rank);
        Assert.Equal(1.0, fit.Leverage[48]);
        Assert.Equal(0.0, fit.Residuals[48]);
        Assert.Equal(0.5, fit.Fitted[48]);
        Assert.True(double.IsNaN(fit.StudentizedInternal[48]));
        Assert.True(double.IsNaN(fit.StudentizedExternal[48]));
        Assert.True(double.IsNaN(fit.CooksDistance[48]));
    }

    [Fact]
    public void Other_rows_are_diagnosed_as_if_the_lone_row_and_its_column_were_absent()
    {
        // The lone row's dummy column absorbs it entirely, so the other 48 rows see the fit of the original design:
        // same residuals, leverages and RSS on the same df (49 − 7 = 48 − 6 = 42), hence the same σ̂ and studentized
        // residuals. Cook's distance divides by the rank, 7 instead of 6. Check values: R's "all" set
        // (Fixtures/lm-diagnostics-poisons.csv). Tolerance 1e-9 relative as in LinearFitDiagnosticsTests.
        var with = PoisonsDesign.Load().With(0.5, "4", "A");
        var fit = LinearFit.Fit(with.Design(), with.Time);
        var expected = LinearFitDiagnosticsTests.RValues("all");
        Close.Relative(0.15817880930859768, fit.ResidualSd, 1e-9);
        for (var i = 0; i < 48; i++)
        {
            var r = expected[i + 1].Select(v => double.TryParse(v, NumberStyles.Float, CultureInfo.InvariantCulture, out var d) ? d : 0).ToArray();
            Close.Relative(r[2], fit.Leverage[i], 1e-9);
            Close.Relative(r[3], fit.StudentizedInternal[i], 1e-9);
            Close.Relative(r[4], fit.StudentizedExternal[i], 1e-9);
            Close.Relative(r[5] * 6 / 7, fit.CooksDistance[i], 1e-9);
            Close.Relative(r[8], fit.Residuals[i], 1e-9);
        }
    }
}
