using System.Globalization;
using CellCheck.Core.Models;
using CellCheck.Core.Tests.Statistics;
using CellCheck.Core.Tests.Support;

namespace CellCheck.Core.Tests.Models;

/// <summary>
/// Case diagnostics against R 4.2.2 on the poisons data, model time ~ poison + treat with treatment contrasts.
/// Check values: Fixtures/lm-diagnostics-poisons.csv, written by Fixtures/lm-diagnostics.R, which for each set d runs
/// <code>
/// m &lt;- lm(time ~ factor(poison) + treat, data = d)
/// hatvalues(m); rstandard(m); rstudent(m); cooks.distance(m); sigma(m); fitted(m); residuals(m)
/// </code>
/// with d = po (all 48 rows) and d = po[-c(1, 6, 11, 20, 33), ] (unbalanced, so that the leverages differ).
/// </summary>
public sealed class LinearFitDiagnosticsTests
{
    /// <summary>Relative tolerance of the brief, 1e-9: the design is well conditioned (0/1 columns), so both R's QR
    /// (LINPACK dqrdc2) and this one are accurate to a few units of 1e-16 relative in every quantity; the smallest
    /// |value| compared is 5.7e-6 (a Cook's distance), so no value is dominated by absolute rounding.</summary>
    private const double Tolerance = 1e-9;

    private static readonly int[] Dropped = [1, 6, 11, 20, 33];

    internal static Dictionary<int, string[]> RValues(string set) => File.ReadAllLines(Fixture.Path("lm-diagnostics-poisons.csv"))
        .Skip(1)
        .Select(l => l.Split(','))
        .Where(f => f[0] == set)
        .ToDictionary(f => int.Parse(f[1], CultureInfo.InvariantCulture), f => f);

    private static double Value(string text) => double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);

    [Theory]
    [InlineData("all")]
    [InlineData("unbalanced")]
    public void Leverage_studentized_residuals_cooks_distance_and_sigma_match_R(string set)
    {
        var poisons = PoisonsDesign.Load();
        var rows = Enumerable.Range(1, 48).Where(r => set == "all" || !Dropped.Contains(r)).ToArray();
        var data = poisons.Rows(rows);
        var fit = LinearFit.Fit(data.Design(), data.Time);
        var expected = RValues(set);
        Assert.Equal(rows.Length, expected.Count);
        Assert.Equal(6, fit.Rank);
        Assert.Empty(fit.Aliased);
        for (var i = 0; i < rows.Length; i++)
        {
            var r = expected[rows[i]];
            Close.Relative(Value(r[2]), fit.Leverage[i], Tolerance);
            Close.Relative(Value(r[3]), fit.StudentizedInternal[i], Tolerance);
            Close.Relative(Value(r[4]), fit.StudentizedExternal[i], Tolerance);
            Close.Relative(Value(r[5]), fit.CooksDistance[i], Tolerance);
            Close.Relative(Value(r[6]), fit.ResidualSd, Tolerance);
            Close.Relative(Value(r[7]), fit.Fitted[i], Tolerance);
            Close.Relative(Value(r[8]), fit.Residuals[i], Tolerance);
        }
    }

    [Fact]
    public void Balanced_design_has_equal_leverage_rank_over_n()
    {
        // Every cell of the 3 × 4 poisons layout has 4 animals, so each h_ii = p/n = 6/48 (a property of balanced
        // additive designs); R's hatvalues shows 0.125 up to rounding of a few 1e-16 (lm-diagnostics-poisons.csv).
        var poisons = PoisonsDesign.Load();
        var fit = LinearFit.Fit(poisons.Design(), poisons.Time);
        Assert.All(fit.Leverage, h => Close.Absolute(0.125, h, 1e-14));
    }
}
