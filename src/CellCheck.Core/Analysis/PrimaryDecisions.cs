using CellCheck.Core.Calibration;
using CellCheck.Core.Cells;
using CellCheck.Core.Residuals;
using CellCheck.Core.Resolution;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Analysis;

/// <summary>
/// Decides each assumption by its primary check: normality and equal spread by the tests <see cref="PrimaryRules"/>
/// chooses, with p-values from the simulated null distribution of this design shape (or asymptotic above the Monte
/// Carlo limit), and independence by Durbin-Watson's exact p when a run order is declared, adjusted by Holm across
/// the assumptions judged.
/// </summary>
internal static class PrimaryDecisions
{
    /// <summary>The primary normality and spread statistics of the observed residuals (computed apart so that a caller can run it alongside other checks).</summary>
    public static (double Normality, double Spread) Statistics(CellPartition partition, ResidualSet residuals, ShapeCalibration calibration) =>
        new PrimaryEvaluator(calibration.Choice, partition.Values.Starts).Stats(residuals.Residuals, residuals.Studentized);

    /// <summary>The primary statistics read off the pooled and spread checks, which compute the same tests on the same
    /// residuals (used when p comes from the reference distributions, so no simulation needs the evaluator).</summary>
    private static (double Normality, double Spread) FromChecks(PooledResult pooled, SpreadResult spread, PrimaryChoice choice, string normalityCheck, string spreadCheck)
    {
        var n = choice.Normality == NormalityPrimary.None ? null : pooled.Checks.FirstOrDefault(c => c.Check == normalityCheck);
        var normality = n is { Statistic: { } w } && n.Reason is null
            ? (choice.Normality == NormalityPrimary.ShapiroWilkPooled ? 1.0 - w : w)
            : double.NaN;
        var sp = choice.Spread == SpreadPrimary.None ? null : spread.Checks.FirstOrDefault(c => c.Check == spreadCheck);
        return (normality, sp is { Statistic: { } f } && sp.Reason is null ? f : double.NaN);
    }

    public static List<AssumptionVerdict> Decide(CellPartition partition, ResidualSet residuals, PooledResult pooled, SpreadResult spread,
        OrderResult order, ShapeCalibration calibration, double alpha, ResolutionSummary? resolution = null, CalibrationSettings? settings = null,
        (double Normality, double Spread)? statistics = null)
    {
        var choice = calibration.Choice;
        double pNormality, pSpread;
        var normalityCheck = choice.Normality == NormalityPrimary.ShapiroWilkPooled ? CheckNames.ShapiroWilk : CheckNames.AndersonDarling;
        var spreadCheck = choice.Spread switch
        {
            SpreadPrimary.Bartlett => CheckNames.Bartlett,
            SpreadPrimary.BrownForsythe => CheckNames.BrownForsythe,
            _ => CheckNames.BrownForsytheZerosRemoved,
        };
        var (normality, spreadStat) = statistics
            ?? (calibration.MonteCarlo ? Statistics(partition, residuals, calibration) : FromChecks(pooled, spread, choice, normalityCheck, spreadCheck));
        if (calibration.MonteCarlo)
        {
            pNormality = calibration.NormalityNull!.PValue(normality);
            pSpread = calibration.SpreadNull!.PValue(spreadStat);
        }
        else
        {
            pNormality = pooled.Checks.FirstOrDefault(c => c.Check == normalityCheck)?.P ?? double.NaN;
            pSpread = spread.Checks.FirstOrDefault(c => c.Check == spreadCheck)?.P ?? double.NaN;
            pNormality = double.IsNaN(normality) ? double.NaN : pNormality;
            pSpread = double.IsNaN(spreadStat) ? double.NaN : pSpread;
        }

        var normalityMethod = (string?)null;
        if (resolution is { Coarse: true, Step: { } step } && choice.Normality != NormalityPrimary.None && residuals.NullPlan.Rows <= (settings ?? CalibrationSettings.Default).MonteCarloLimit)
        {
            var plan = residuals.WithinCellShift ? CellMeansPlan.ForLayout(partition.Values.Starts) : residuals.NullPlan;
            const int Draws = 999;
            pNormality = RoundedNormality.PValue(plan, choice, residuals.Fitted, residuals.ResidualSd, step, normality, Draws, (settings ?? CalibrationSettings.Default).Seed + 7);
            normalityMethod = "simulated with values rounded to the recording step " + NumberText.Value(step, 6) + " (" + NumberText.Count(Draws) + " draws)";
        }

        var dw = order.Checks.FirstOrDefault(c => c.Check == CheckNames.DurbinWatson);
        var pOrder = dw?.P ?? double.NaN;
        var adjusted = FamilyDecision.Adjusted([pNormality, pSpread, pOrder]);
        var method = calibration.MonteCarlo
            ? "simulated for this design (" + NumberText.Count(calibration.NormalityNull!.Draws) + " null draws)"
            : "asymptotic (design above the simulation limit)";
        var normalityStatistic = choice.Normality == NormalityPrimary.ShapiroWilkPooled ? 1.0 - normality : normality;
        return
        [
            Verdict(AssumptionNames.Normality, choice.Normality == NormalityPrimary.None ? null : normalityCheck, normalityStatistic,
                pNormality, adjusted[0], alpha, choice.NormalityReason, normalityMethod ?? method,
                choice.Normality == NormalityPrimary.None ? NotTestableReason.TooFewValues : NotTestableReason.ZeroSpread),
            Verdict(AssumptionNames.EqualSpread, choice.Spread == SpreadPrimary.None ? null : spreadCheck, spreadStat,
                pSpread, adjusted[1], alpha, choice.SpreadReason, method,
                choice.Spread == SpreadPrimary.None ? NotTestableReason.TooFewGroups : SpreadReason(spread, spreadCheck)),
            Independence(order, dw, adjusted[2], alpha),
        ];
    }

    private static AssumptionVerdict Verdict(string name, string? check, double statistic, double p, double adjusted, double alpha,
        string rule, string method, string reasonIfMissing)
    {
        if (check is null || double.IsNaN(p))
        {
            return new AssumptionVerdict(name, check, null, null, null, CheckStatus.NotTestable, reasonIfMissing, rule, method);
        }

        return new AssumptionVerdict(name, check, statistic, p, adjusted, StatusRules.FromP(adjusted, alpha), null, rule, method);
    }

    private static AssumptionVerdict Independence(OrderResult order, CheckResult? dw, double adjusted, double alpha)
    {
        const string Rule = "Durbin-Watson on the model residuals in run order, against positive autocorrelation (drift and carry-over "
            + "make neighbouring runs alike): its p is exact for the fitted design under normal errors (Imhof 1961), with the "
            + "normal approximation using the design's exact mean and variance of d above 1000 rows";
        if (order.Column is null)
        {
            return new AssumptionVerdict(AssumptionNames.Independence, null, null, null, null, CheckStatus.NotTestable, NotTestableReason.NoRunOrder,
                Rule, "none");
        }

        if (dw is null || dw.P is null)
        {
            return new AssumptionVerdict(AssumptionNames.Independence, CheckNames.DurbinWatson, null, null, null, CheckStatus.NotTestable,
                dw?.Reason ?? NotTestableReason.TooFewValues, Rule, "none");
        }

        return new AssumptionVerdict(AssumptionNames.Independence, CheckNames.DurbinWatson, dw.Statistic, dw.P, adjusted,
            StatusRules.FromP(adjusted, alpha), null, Rule, order.Method ?? "exact");
    }

    private static string SpreadReason(SpreadResult spread, string check) =>
        spread.Checks.FirstOrDefault(c => c.Check == check)?.Reason ?? NotTestableReason.DegenerateWithinGroups;
}
