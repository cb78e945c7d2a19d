using CellCheck.Core.Analysis;

namespace CellCheck.IO.Tests;

/// <summary>
/// The whole pipeline (design file, data reader, cells, residuals, checks) on published data sets, against the
/// values in the shared reference README (sources per value below). Tolerances: closed-form statistics 1e-9
/// relative (R and our double arithmetic agree to about 1e-12); p-values from the same distribution functions 1e-8 relative.
/// </summary>
public sealed class ReferenceDatasetTests
{
    private const double Closed = 1e-9;
    private const double PTol = 1e-8;

    private static ResponseReport Run(string design)
    {
        var run = CheckRun.Run(Path.Combine(AppContext.BaseDirectory, "Fixtures", design));
        Assert.True(run.Ok, string.Join("; ", run.Problems.Select(p => p.What)));
        return Assert.Single(run.Value!.Report.Responses);
    }

    private static void Near(double expected, double? actual, double relative) =>
        Assert.True(actual is { } a && Math.Abs(a - expected) <= relative * Math.Abs(expected), $"expected {expected:R}, got {actual:R}");

    private static void Expect(IEnumerable<CheckResult> checks, string name, double statistic, double p)
    {
        var c = checks.Single(k => k.Check == name);
        Near(statistic, c.Statistic, Closed);
        Near(p, c.P, PTol);
    }

    [Fact]
    public void Insect_sprays_pooled_residual_normality_matches_r_and_scipy()
    {
        var r = Run("insect-sprays.yaml");
        // R 4.2.2: shapiro.test(residuals(lm(count ~ spray, InsectSprays))) (shared reference README)
        Expect(r.Pooled.Checks, CheckNames.ShapiroWilk, 0.960058542809377, 0.0222598867824892);
        // R 4.2.2: nortest::ad.test(residuals(lm(count ~ spray))) (shared reference README)
        Expect(r.Pooled.Checks, CheckNames.AndersonDarling, 1.20153037501736, 0.00365072538507932);
        // scipy 1.10: stats.normaltest(residuals) on the same one-way residuals
        Expect(r.Pooled.Checks, CheckNames.DagostinoPearson, 3.20050943352347, 0.20184509811641665);
    }

    [Fact]
    public void Insect_sprays_spread_tests_match_r()
    {
        var r = Run("insect-sprays.yaml");
        // R stats examples (K² 25.96, X² 14.483) and full precision R 4.2.2 (shared reference README)
        Expect(r.Spread.Checks, CheckNames.Bartlett, 25.9598253203687, 9.08512233294531e-05);
        Expect(r.Spread.Checks, CheckNames.BrownForsythe, 3.82135631322592, 0.00422279113899214);
        Expect(r.Spread.Checks, CheckNames.Levene, 6.4553527100867, 6.10363383448211e-05);
        Expect(r.Spread.Checks, CheckNames.FlignerKilleen, 14.4827810384586, 0.0128167791897092);
        Assert.Equal([5.0, 66.0], r.Spread.Checks.Single(k => k.Check == CheckNames.Levene).Df);
    }

    [Fact]
    public void Plant_growth_pooled_residuals_match_r()
    {
        var r = Run("plant-growth.yaml");
        // R 4.2.2 shapiro.test / nortest::ad.test on residuals(lm(weight ~ group)) (shared reference README)
        Expect(r.Pooled.Checks, CheckNames.ShapiroWilk, 0.966068118874185, 0.43789859550621);
        Expect(r.Pooled.Checks, CheckNames.AndersonDarling, 0.358195871536843, 0.42994325492986);
        // scipy 1.10: stats.normaltest(residuals)
        Expect(r.Pooled.Checks, CheckNames.DagostinoPearson, 1.8346442599770851, 0.3995876534375324);
        // R 4.2.2 (shared reference README)
        Expect(r.Spread.Checks, CheckNames.Bartlett, 2.87857378723609, 0.237096773634558);
        Expect(r.Spread.Checks, CheckNames.Levene, 1.23696295446978, 0.306194922991448);
    }

    [Fact]
    public void Poisons_twelve_cells_spread_tests_match_r()
    {
        var r = Run("poisons.yaml");
        Assert.Equal(12, r.Census.Cells);
        Assert.True(r.Census.Balanced);
        // R 4.2.2 on the 12 poison x treatment cells (shared reference README)
        Expect(r.Spread.Checks, CheckNames.Bartlett, 45.1368852191499, 4.5904618558008e-06);
        Expect(r.Spread.Checks, CheckNames.BrownForsythe, 4.13232964381262, 0.000583347544951762);
        Expect(r.Spread.Checks, CheckNames.Levene, 4.85353656448022, 0.000144243430520681);
        // Fligner-Killeen with ties kept exact (R's 30.8987 breaks decimal ties by binary rounding noise; see
        // FlignerKilleen remarks): tests/CellCheck.Core.Tests/Fixtures/fligner-exact-ties.py
        Expect(r.Spread.Checks, CheckNames.FlignerKilleen, 31.05196813358158, 0.0010808041543472772);
        Assert.Equal(CheckStatus.Flag, r.Verdict.Status);
    }

    [Fact]
    public void Gear_spread_tests_match_the_nist_handbook_and_r()
    {
        var r = Run("gear.yaml");
        // NIST e-Handbook 1.3.5.7 Bartlett T = 20.78580, 1.3.5.10 Levene (median) W = 1.705910; full precision scipy/R (shared reference README)
        Expect(r.Spread.Checks, CheckNames.Bartlett, 20.78587342806484, 0.0136358632781);
        Expect(r.Spread.Checks, CheckNames.BrownForsythe, 1.7059176930008939, 0.0990829755522);
        Expect(r.Spread.Checks, CheckNames.Levene, 2.15945985647285, 0.032236826559783);
        // exact-tie Fligner-Killeen (R and scipy give 11.1507930855942 by rounding noise): fligner-exact-ties.py
        Expect(r.Spread.Checks, CheckNames.FlignerKilleen, 11.146469450974557, 0.2658027098407764);
    }
}
