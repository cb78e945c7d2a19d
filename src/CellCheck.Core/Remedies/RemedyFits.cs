using CellCheck.Core.Cells;
using CellCheck.Core.Data;
using CellCheck.Core.Models;

namespace CellCheck.Core.Remedies;

/// <summary>
/// The likelihood fits behind the transformation advice for one response at one shift: the Box-Cox λ̂ and interval
/// (or why there is none), the Yeo-Johnson fit where values are not all positive or it is asked for, and the facts the
/// notes quote. Computed on their own so that a large check can run them alongside its other checks.
/// </summary>
internal sealed record RemedyFits(double Shift, int NonPositive, double Min, double Max, string? Degenerate, string? BoxCoxReason, PowerFit? BoxCox, PowerFit? YeoJohnson,
    bool YeoJohnsonAsked)
{
    public static RemedyFits Compute(DesignData data, ModelSpec spec, CellPartition partition, ModelInfo fitted, ResponseColumn column, double shift, bool wantsYeoJohnson)
    {
        // y_i = origin + shift + value_i, read on demand: the blocked model's fits need no copy of the data
        var y = new ShiftedValues(partition.Values.Values, column.Origin + shift);
        double min = double.NaN, max = double.NaN;
        var nonPositive = 0;
        for (var i = 0; i < y.Length; i++)
        {
            var v = y[i];
            nonPositive += v > 0 ? 0 : 1;
            min = i == 0 ? v : Math.Min(min, v);
            max = i == 0 ? v : Math.Max(max, v);
        }

        var rss = y.Length == 0 ? null : RemedyAnalyzer.Model(data, spec, partition, fitted);
        double[]? copy = null;
        double[] Copy() => copy ??= y.ToArray();
        var degenerate = rss is null || rss.ResidualDf < 1 ? RemedyReason.NoResidualDf
            : (rss is SettingRss settings ? settings.Of(y) : rss.Of(Copy())) == 0 ? RemedyReason.ZeroSpread : null;
        var boxCoxReason = degenerate ?? (nonPositive > 0 ? RemedyReason.NonPositiveValues : null);
        var boxCox = boxCoxReason is null ? (rss is SettingRss blocked ? Remedies.BoxCox.Fit(blocked, y, fitted.Name, shift) : Remedies.BoxCox.Fit(rss!, Copy(), fitted.Name, shift)) : null;
        var yeoJohnson = degenerate is null && (nonPositive > 0 || wantsYeoJohnson) ? Remedies.YeoJohnson.Fit(rss!, Copy(), fitted.Name, shift) : null;
        return new RemedyFits(shift, nonPositive, min, max, degenerate, boxCoxReason, boxCox, yeoJohnson, wantsYeoJohnson);
    }

    /// <summary>True when these fits answer a request at <paramref name="shift"/> (a Yeo-Johnson fit asked for is there).</summary>
    public bool Serves(double shift, bool wantsYeoJohnson) => Shift == shift && (!wantsYeoJohnson || YeoJohnsonAsked || NonPositive > 0 || Degenerate is not null);
}
