using CellCheck.Core.Cells;
using CellCheck.Core.Data;
using CellCheck.Core.Models;
using CellCheck.Core.Residuals;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Analysis;

/// <summary>Runs the checks of the model's form on a fitted response.</summary>
internal static class ModelChecks
{
    public static ModelResult Run(CellPartition partition, IReadOnlyList<FactorColumn> blocks, ModelSpec spec, ResidualSet residuals,
        LineNumbers sourceLines, double alpha)
    {
        var diagnostics = residuals.Diagnostics!;
        var info = diagnostics.Model;
        var notes = new List<string>();
        if (info.Note is { } note)
        {
            notes.Add(note);
        }
        var checks = new List<CheckResult>();
        var fit = diagnostics.Fit;
        var (settings, settingCount) = SettingGroups.Of(partition, blocks);
        if (fit is not null && diagnostics.Estimable is { } estimable)
        {
            // Tukey's test needs fitted values that are not already a full cell-means fit: an additive model, or
            // treatments (with any interactions) plus additive blocks
            checks.Add(spec.IsAdditive || blocks.Count > 0
                ? CheckResults.From(CheckNames.TukeyNonadditivity, TukeyNonadditivity.Test(estimable, fit), alpha)
                : CheckResults.NotTestable(CheckNames.TukeyNonadditivity, NotTestableReason.NotAdditive));
            checks.Add(CheckResults.From(CheckNames.LackOfFit, LackOfFit.Test(fit, partition.Values.Values, settings), alpha));
        }
        else if (diagnostics.Absorbed is { } absorbed)
        {
            var rss = residuals.ResidualSd * residuals.ResidualSd * residuals.ResidualDf;
            checks.Add(CheckResults.From(CheckNames.TukeyNonadditivity,
                TukeyNonadditivity.Test(residuals.Residuals, partition.Values.Values, rss, residuals.ResidualDf, absorbed), alpha));
            checks.Add(CheckResults.From(CheckNames.LackOfFit, LackOfFit.Test(residuals.ResidualDf, rss, partition.Values.Values, settings), alpha));
        }
        else
        {
            // the cell-means model: fitted values are the cell means, so neither test has anything to test
            checks.Add(CheckResults.NotTestable(CheckNames.TukeyNonadditivity, NotTestableReason.NotAdditive));
            checks.Add(CheckResults.NotTestable(CheckNames.LackOfFit, NotTestableReason.SaturatedModel));
        }

        var screen = diagnostics.ScreenOutliers(residuals.ResidualDf, out var screened);
        var outliers = screen.Where(s => s.PAdjusted < alpha)
            .Select(s => new OutlierRow(sourceLines[partition.RowOrder[s.Row]], s.T, s.PAdjusted)).ToList();
        checks.Add(screened == 0
            ? CheckResults.NotTestable(CheckNames.Outliers, NotTestableReason.TooFewResidualDf)
            : new CheckResult(CheckNames.Outliers, Math.Abs(screen[0].T), null, screen[0].PAdjusted, null, StatusRules.FromP(screen[0].PAdjusted, alpha), null));
        Unreplicated(settingCount, partition.RowOrder.Length, blocks, residuals, notes);
        var (effects, names) = Effects(partition, blocks, spec, residuals);
        return new ModelResult(info, checks, outliers, screened, effects, names, notes);
    }

    private static void Unreplicated(int settingCount, int rows, IReadOnlyList<FactorColumn> blocks, ResidualSet residuals, List<string> notes)
    {
        if (settingCount == rows)
        {
            notes.Add(blocks.Count > 0
                ? "Each cell holds one row per block: within-cell variance cannot be estimated apart from the model, so every check here rests on the declared model."
                : "No setting is replicated: within-cell variance cannot be estimated, so every check here rests on the declared model.");
        }

        var leverageOne = residuals.Diagnostics!.LeverageOneRows.AtLeastOne;
        if (leverageOne > 0)
        {
            notes.Add(leverageOne.ToString(System.Globalization.CultureInfo.InvariantCulture)
                + " row(s) have leverage 1: the model fits them exactly, so their residuals carry no information and are not used.");
        }
    }

    private static (LenthResult?, IReadOnlyList<string>) Effects(CellPartition partition, IReadOnlyList<FactorColumn> blocks, ModelSpec spec, ResidualSet residuals)
    {
        var twoLevel = partition.Factors.All(f => f.Levels.Count == 2 && !f.IsNumeric);
        if (residuals.ResidualDf > 0 || blocks.Count > 0 || !twoLevel || partition.Factors.Count < 2)
        {
            return (null, []);
        }

        var codes = partition.Factors.Select(f => partition.RowOrder.Select(r => f.Codes[r]).ToArray()).ToList();
        var terms = spec.Terms.Select(t => t.Factors).ToList();
        return (LenthEffects.Analyze(codes, partition.Values.Values, terms), spec.Terms.Select(t => t.Name(partition.Factors)).ToArray());
    }
}
