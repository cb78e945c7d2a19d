using CellCheck.Core.Analysis;
using CellCheck.Core.Cells;
using CellCheck.Core.Data;
using CellCheck.Core.Models;

namespace CellCheck.Core.Remedies;

/// <summary>
/// Transformation advice for one response, and the re-check on the transformed response when one is requested:
/// the Box-Cox λ̂ and interval on the declared model (Yeo-Johnson when values are not all positive), the
/// spread-versus-level power, the recommended transformation, every check re-run on the transformed response,
/// a before-and-after comparison, and advice.
/// </summary>
public static class RemedyAnalyzer
{
    /// <param name="before">The report of the untransformed response (<see cref="ResponseAnalyzer.Analyze"/>).</param>
    /// <param name="request">What to apply; null to give advice only.</param>
    public static RemedyResult Analyze(DesignData data, int response, AnalysisOptions options, ModelSpec? spec, ResponseReport before, TransformRequest? request = null)
    {
        ArgumentNullException.ThrowIfNull(data);
        ArgumentNullException.ThrowIfNull(options);
        ArgumentNullException.ThrowIfNull(before);
        spec ??= ModelSpec.Full(data.Factors.Count);
        var column = data.Responses[response];
        var shift = request?.Shift ?? 0;
        var partition = before.Partition ?? column.PartitionBy(data.Factors, data.Blocks);
        var wantsYeoJohnson = request is { Family: PowerFamily.YeoJohnson, Power: null };
        var fits = before.RemedyFits is { } early && early.Serves(shift, wantsYeoJohnson)
            ? early
            : RemedyFits.Compute(data, spec, partition, before.Model.Info, column, shift, wantsYeoJohnson);
        var (nonPositive, boxCoxReason, boxCox, yeoJohnson) = (fits.NonPositive, fits.BoxCoxReason, fits.BoxCox, fits.YeoJohnson);
        var spreadLevel = SpreadLevel.Fit(before.Cells.Select(c => c.N).ToArray(), before.Cells.Select(c => c.Mean + shift).ToArray(), before.Cells.Select(c => c.Sd).ToArray());
        var recommendedFit = boxCox ?? yeoJohnson;
        var recommended = recommendedFit is null ? null : PowerLadder.Recommend(recommendedFit);
        var notes = RemedyNotes.Before(boxCox, yeoJohnson, recommended, nonPositive, fits.Min, fits.Max, shift, before.Model.Outliers.Count);
        var (choice, notApplied) = Choose(request, recommended, yeoJohnson, nonPositive);
        ResponseReport? after = null;
        double? slopeAfter = null;
        IReadOnlyList<ComparisonRow> comparison = [];
        var transformed = choice is null ? null : ResponseTransform.Apply(column, partition.RowOrder, choice);
        if (transformed is not null && !(double.IsFinite(transformed.Origin) && AllFinite(transformed.Values, partition.RowOrder)))
        {
            (choice, transformed, notApplied) = (null, null, RemedyReason.NotFinite);
        }

        if (choice is not null && transformed is not null)
        {
            var afterData = new DesignData(data.Factors, [transformed], data.SourceLines, [data.Excluded[response]], data.Blocks)
            {
                RunOrder = data.RunOrder,
                RunOrderColumn = data.RunOrderColumn,
            };
            after = ResponseAnalyzer.Analyze(afterData, 0, options with { EarlyRemedy = false }, spec);
            slopeAfter = SpreadLevel.Fit(after.Cells.Select(c => c.N).ToArray(), before.Cells.Select(c => c.Mean + shift).ToArray(), after.Cells.Select(c => c.Sd).ToArray()).Slope;
            comparison = RemedyComparison.Build(before, after);
            notes.Add("Every check was re-run on " + choice.Formula(column.Name) + ".");
        }
        else if (notApplied is not null)
        {
            notes.Add(RemedyNotes.NotApplied(notApplied, request!));
        }

        return new RemedyResult(boxCox, boxCoxReason, spreadLevel, recommended, notes, RemedyAdvice.For(before, recommended, after))
        {
            YeoJohnson = yeoJohnson,
            Requested = request,
            Applied = choice,
            NotAppliedReason = notApplied,
            After = after,
            SpreadLevelSlopeAfter = slopeAfter,
            Comparison = comparison,
        };
    }

    private static (TransformChoice? Choice, string? Reason) Choose(TransformRequest? request, TransformChoice? recommended, PowerFit? yeoJohnson, int nonPositive)
    {
        switch (request)
        {
            case null:
                return (null, null);
            case { IsAuto: true }:
                return recommended is null ? (null, RemedyReason.NoEstimate)
                    : recommended.IsIdentity ? (null, RemedyReason.NotNeeded)
                    : (recommended, null);
            case { Family: PowerFamily.YeoJohnson, Power: null }:
                return yeoJohnson is null ? (null, RemedyReason.NoEstimate)
                    : (new TransformChoice(PowerFamily.YeoJohnson, Math.Round(yeoJohnson.Lambda, 2, MidpointRounding.AwayFromZero), request.Shift), null);
            case { Family: PowerFamily.BoxCox } when nonPositive > 0:
                return (null, RemedyReason.NonPositiveValues);
            default:
                return (new TransformChoice(request.Family!.Value, request.Power!.Value, request.Shift), null);
        }
    }

    /// <summary>The residual sum of squares of the declared model for the partition's rows: about the cell means for
    /// the full factorial in categorical factors without blocks, otherwise by QR of the estimable design columns.</summary>
    internal static IResidualSumOfSquares Model(DesignData data, ModelSpec spec, CellPartition partition, ModelInfo fitted)
    {
        if (fitted.Absorbed && SettingRss.Build(partition, data.Blocks) is { } settings)
        {
            return settings;
        }

        // the residual sources name the cell-means fit "cell-means" whenever they use it (the declared full factorial
        // without blocks, or a stand-in with a note), so the name decides here as well
        if (fitted.Name == "cell-means")
        {
            return new GroupedRss(partition.Values.Starts);
        }

        var design = DesignMatrixBuilder.Build(partition.Factors, data.Blocks, spec, partition.RowOrder);
        var kept = OrderedRank.KeptColumns(design.X);
        var x = new double[design.Rows, kept.Length];
        for (var i = 0; i < design.Rows; i++)
        {
            for (var k = 0; k < kept.Length; k++)
            {
                x[i, k] = design.X[i, kept[k]];
            }
        }

        return new ProjectedRss(x);
    }

    private static bool AllFinite(double[] values, int[] rows) => rows.All(r => double.IsFinite(values[r]));
}
