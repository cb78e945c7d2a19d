using CellCheck.Core.Analysis;
using CellCheck.Core.Remedies;

namespace CellCheck.IO.Tests;

/// <summary>
/// Transformation remedies end to end on published data: the poisons survival times (Box &amp; Cox 1964) before and
/// after the reciprocal, against the shared reference set ("Box-Cox" and "Spread across groups", R 4.2.2), and the
/// insect-spray counts, whose zeros rule out Box-Cox. Closed-form statistics 1e-9 relative, p-values 1e-8 relative
/// (as in ReferenceDatasetTests); λ̂ 1e-6 absolute (a flat maximum is placed only to about √ε by any optimiser).
/// </summary>
public sealed class RemedyReferenceTests
{
    private static ResponseReport Run(string design, TransformRequest? transform = null)
    {
        var run = CheckRun.Run(Path.Combine(AppContext.BaseDirectory, "Fixtures", design), transform: transform);
        Assert.True(run.Ok, string.Join("; ", run.Problems.Select(p => p.What)));
        return Assert.Single(run.Value!.Report.Responses);
    }

    private static void Near(double expected, double? actual, double relative) =>
        Assert.True(actual is { } a && Math.Abs(a - expected) <= relative * Math.Abs(expected), $"expected {expected:R}, got {actual:R}");

    private static void Expect(ResponseReport r, string check, double statistic, double p)
    {
        var c = r.Spread.Checks.Single(k => k.Check == check);
        Near(statistic, c.Statistic, 1e-9);
        Near(p, c.P, 1e-8);
    }

    [Fact]
    public void The_poisons_reciprocal_removes_the_spread_flag_with_the_published_statistics_before_and_after()
    {
        var r = Run("poisons-additive.yaml", new TransformRequest(PowerFamily.BoxCox, -1));
        var m = r.Remedy!;
        // shared reference "Box-Cox": additive model lambda-hat -0.750162520648086, interval (-1.13803, -0.35609)
        Assert.Equal("poison + treat", m.BoxCox!.Model);
        Assert.Equal(-0.750162520648086, m.BoxCox.Lambda, 1e-6);
        Assert.Equal(-1.13803, m.BoxCox.CiLower!.Value, 5e-6);
        Assert.Equal(-0.35609, m.BoxCox.CiUpper!.Value, 5e-6);
        Assert.Equal("reciprocal", m.Recommended!.Name);
        // shared reference "Spread across groups", poisons 12 cells, time: Bartlett K2 45.1368852191499 (11 df,
        // p 4.5904618558008e-06), Brown-Forsythe F 4.13232964381262 (11, 36; p 0.000583347544951762) [R]
        Expect(r, CheckNames.Bartlett, 45.1368852191499, 4.5904618558008e-06);
        Expect(r, CheckNames.BrownForsythe, 4.13232964381262, 0.000583347544951762);
        var after = m.After!;
        Assert.Equal("reciprocal", m.Applied!.Name);
        // same table, 1/time: Bartlett 9.89974802241643 (11, 0.53942686688668), Brown-Forsythe 1.12722562531248
        // (11, 36; 0.36982143682594) [R]
        Expect(after, CheckNames.Bartlett, 9.89974802241643, 0.53942686688668);
        Expect(after, CheckNames.BrownForsythe, 1.12722562531248, 0.36982143682594);
        Assert.Equal(CheckStatus.Flag, r.Verdict.Status);
        Assert.Equal(CheckStatus.Pass, after.Verdict.Status);
        Assert.Equal(CheckStatus.Pass, RemedyStatus.Of(r with { }));
        // R: slope of log SD(1/time) on log mean(time) over the cells = -0.0026885467419746414 (Fixtures of the core tests)
        Near(-0.0026885467419746414, m.SpreadLevelSlopeAfter, 1e-9);
        var spreadRow = m.Comparison.Single(c => c.Item == AssumptionNames.EqualSpread);
        Assert.Equal((CheckStatus.Flag, CheckStatus.Pass), (spreadRow.Before.Status, spreadRow.After.Status));
    }

    [Fact]
    public void Auto_applies_the_recommended_power_and_without_a_request_only_advice_is_given()
    {
        Assert.Equal("reciprocal", Run("poisons-additive.yaml", TransformRequest.Auto()).Remedy!.Applied!.Name);
        var advice = Run("poisons-additive.yaml").Remedy!;
        Assert.Null(advice.After);
        Assert.Null(advice.Applied);
        Assert.Equal("reciprocal", advice.Recommended!.Name);
        Assert.Contains(advice.Advice, a => a.Contains("pre-tests", StringComparison.Ordinal));
    }

    [Fact]
    public void The_full_factorial_design_states_its_own_model()
    {
        var m = Run("poisons.yaml").Remedy!;
        // R: MASS::boxcox(lm(time ~ poison * treat)) with optimize: -0.81573613560890923 (core tests' fixture script)
        Assert.Equal("cell-means", m.BoxCox!.Model);
        Assert.Equal(-0.81573613560890923, m.BoxCox.Lambda, 1e-6);
    }

    [Fact]
    public void Counts_with_zeros_get_yeo_johnson_and_no_silent_shift()
    {
        var r = Run("insect-sprays.yaml", new TransformRequest(PowerFamily.BoxCox, 0));
        var m = r.Remedy!;
        Assert.Null(m.BoxCox);
        Assert.Equal(RemedyReason.NonPositiveValues, m.BoxCoxReason);
        // R 4.2.2, the Yeo-Johnson profile likelihood written out (core tests' Fixtures/remedy-check-values.R):
        // one-way model on InsectSprays, lambda 0.28401045202949521
        Assert.Equal(0.28401045202949521, m.YeoJohnson!.Lambda, 1e-6);
        Assert.Null(m.After);
        Assert.Equal(RemedyReason.NonPositiveValues, m.NotAppliedReason);
        Assert.Contains(m.Notes, n => n.Contains("Yeo-Johnson", StringComparison.Ordinal) && n.Contains("shift", StringComparison.Ordinal));
    }

    [Fact]
    public void A_stated_shift_is_applied_and_named()
    {
        var m = Run("insect-sprays.yaml", new TransformRequest(PowerFamily.BoxCox, 0, 1)).Remedy!;
        Assert.NotNull(m.BoxCox);
        Assert.Equal(1, m.BoxCox!.Shift);
        Assert.Equal("log(count + 1)", m.Applied!.Formula("count"));
        Assert.NotNull(m.After);
        Assert.Contains(m.Notes, n => n.StartsWith("As stated, 1 was added", StringComparison.Ordinal));
    }

    [Fact]
    public void Yeo_johnson_at_its_estimate_is_applied_when_asked()
    {
        var m = Run("insect-sprays.yaml", new TransformRequest(PowerFamily.YeoJohnson, null)).Remedy!;
        // the estimate 0.284 rounded to two decimals
        Assert.Equal("yeo-johnson:0.28", m.Applied!.Name);
        Assert.NotNull(m.After);
    }

    [Fact]
    public void A_power_that_overflows_is_not_applied_and_the_rest_goes_on()
    {
        using var t = new TempDesign("a,y\n1,1e-70\n1,2e-70\n1,4e-70\n2,3e-70\n2,5e-70\n2,6e-70\n", "data: data.csv\nfactors: [a]\nresponses: [y]\n");
        var run = CheckRun.Run(t.DesignPath, transform: new TransformRequest(PowerFamily.BoxCox, -5));
        Assert.True(run.Ok);
        var m = Assert.Single(run.Value!.Report.Responses).Remedy!;
        Assert.Equal(RemedyReason.NotFinite, m.NotAppliedReason);
        Assert.Null(m.After);
        Assert.NotNull(m.BoxCox);
    }
}
