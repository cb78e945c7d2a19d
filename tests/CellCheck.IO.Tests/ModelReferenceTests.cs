using CellCheck.Core.Analysis;

namespace CellCheck.IO.Tests;

/// <summary>
/// Declared models end to end against R 4.2.2 (commands beside each value). Residual SD and F statistics are closed
/// form (1e-9 relative); p-values from the same F tail (1e-8 relative).
/// </summary>
public sealed class ModelReferenceTests
{
    private static ResponseReport Run(string design)
    {
        var run = CheckRun.Run(Path.Combine(AppContext.BaseDirectory, "Fixtures", design));
        Assert.True(run.Ok, string.Join("; ", run.Problems.Select(p => p.What)));
        return Assert.Single(run.Value!.Report.Responses);
    }

    private static void Near(double expected, double? actual, double relative) =>
        Assert.True(actual is { } a && Math.Abs(a - expected) <= relative * Math.Abs(expected), $"expected {expected:R}, got {actual:R}");

    private static CheckResult Check(ResponseReport r, string name) => r.Model.Checks.Single(c => c.Check == name);

    [Fact]
    public void The_additive_poisons_model_matches_r()
    {
        var r = Run("poisons-additive.yaml");
        Assert.Equal(42, r.Model.Info.ResidualDf);
        Assert.Equal(["poison", "treat"], r.Model.Info.Terms);
        // R: sigma(lm(time ~ factor(poison) + treat, poisons)) = 0.158178809308598
        Near(0.158178809308598, r.Pooled.ResidualSd, 1e-9);
        // R: anova(m, lm(time ~ factor(poison) + treat + I(fitted(m)^2))) -> F 7.02532738772373, p 0.0113679886762397
        Near(7.02532738772373, Check(r, CheckNames.TukeyNonadditivity).Statistic, 1e-9);
        Near(0.0113679886762397, Check(r, CheckNames.TukeyNonadditivity).P, 1e-8);
        // R: anova(additive, lm(time ~ factor(poison) * treat)) -> F 1.87433263604858 on 6 and 36 df, p 0.112250608311412
        Near(1.87433263604858, Check(r, CheckNames.LackOfFit).Statistic, 1e-9);
        Assert.Equal([6.0, 36.0], Check(r, CheckNames.LackOfFit).Df);
        Near(0.112250608311412, Check(r, CheckNames.LackOfFit).P, 1e-8);
        // R: max(abs(rstudent(m))) = 3.89489773109439 (row 20 of the data, line 21)
        Near(3.89489773109439, Check(r, CheckNames.Outliers).Statistic, 1e-9);
    }

    [Fact]
    public void The_blocked_npk_trial_reports_the_interaction_confounded_with_blocks()
    {
        var r = Run("npk-blocked.yaml");
        // R: coef(lm(yield ~ N*P*K + block, npk)) has NA for N1:P1:K1; sigma 3.92944723282494 on 12 df
        Assert.Equal(["N[1]:P[1]:K[1]"], r.Model.Info.AliasedColumns);
        Assert.Equal(["N*P*K"], r.Model.Info.AliasedTerms);
        Assert.Equal(12, r.Model.Info.ResidualDf);
        Near(3.92944723282494, r.Pooled.ResidualSd, 1e-9);
        // R: anova(m, update(m, . ~ . + I(fitted(m)^2))) -> F 0.417640213119235, p 0.531368436710655
        Near(0.417640213119235, Check(r, CheckNames.TukeyNonadditivity).Statistic, 1e-9);
        Near(0.531368436710655, Check(r, CheckNames.TukeyNonadditivity).P, 1e-8);
        // R: max(abs(rstudent(m))) = 2.18782648675244
        Near(2.18782648675244, Check(r, CheckNames.Outliers).Statistic, 1e-9);
        Assert.Contains(r.Verdict.Findings, f => f.Contains("N[1]:P[1]:K[1]", StringComparison.Ordinal));
        Assert.Contains(r.Model.Notes, n => n.Contains("one row per block", StringComparison.Ordinal));
    }

    [Fact]
    public void The_full_poisons_model_is_the_cell_means_model()
    {
        var run = CheckRun.Run(Path.Combine(AppContext.BaseDirectory, "Fixtures", "poisons.yaml"));
        var r = Assert.Single(run.Value!.Report.Responses);
        // R: sigma(lm(time ~ factor(poison) * treat, poisons)) = 0.149138731089919
        Near(0.149138731089919, r.Pooled.ResidualSd, 1e-9);
        Assert.Equal("cell-means", r.Model.Info.Name);
        Assert.Equal(CheckStatus.NotTestable, Check(r, CheckNames.LackOfFit).Status);
    }

    [Fact]
    public void An_unreplicated_two_level_factorial_is_judged_by_its_effects_with_lenth_margins()
    {
        // R 4.2.2 on the invented 2^4 sample: e <- 2 * coef(lm(y ~ A*B*C*D, X))[-1] with X = expand.grid(+-1);
        // s0 <- 1.5 * median(abs(e)); pse <- 1.5 * median(abs(e)[abs(e) < 2.5 * s0]) = 4.5;
        // qt(0.975, 15/3) * pse = 11.5676182603634; qt((1 + 0.95^(1/15)) / 2, 15/3) * pse = 23.4839306790898 (Lenth 1989 formulas)
        var r = Run("unreplicated-2x4.yaml");
        var e = r.Model.Effects!;
        Assert.Equal(0, r.Model.Info.ResidualDf);
        Assert.Equal(4.5, e.PseudoStandardError, 1e-12);
        Near(11.5676182603634, e.MarginOfError, 1e-9);
        Near(23.4839306790898, e.SimultaneousMargin, 1e-9);
        var effects = r.Model.EffectNames.Zip(e.Effects).ToDictionary(p => p.First, p => p.Second);
        Assert.Equal(20.0, effects["a"], 1e-9);
        Assert.Equal(-14.5, effects["a*c"], 1e-9);
        Assert.Equal(11.5, effects["a*d"], 1e-9);
        Assert.Contains(r.Verdict.Findings, f => f.Contains("Lenth", StringComparison.Ordinal) && f.Contains("a 20", StringComparison.Ordinal));
    }
}
