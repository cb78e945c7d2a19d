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
        var values = partition.Values.Values;
        var y = new double[values.Length];
        double min = double.NaN, max = double.NaN;
        var nonPositive = 0;
        for (var i = 0; i < y.Length; i++)
        {
            y[i] = column.Origin + shift + values[i];
            nonPositive += y[i] > 0 ? 0 : 1;
            min = i == 0 ? y[i] : Math.Min(min, y[i]);
            max = i == 0 ? y[i] : Math.Max(max, y[i]);
        }

        var rss = y.Length == 0 ? null : RemedyAnalyzer.Model(data, spec, partition, fitted);
        var degenerate = rss is null || rss.ResidualDf < 1 ? RemedyReason.NoResidualDf : rss.Of(y) == 0 ? RemedyReason.ZeroSpread : null;
        var boxCoxReason = degenerate ?? (nonPositive > 0 ? RemedyReason.NonPositiveValues : null);
        var boxCox = boxCoxReason is null ? Remedies.BoxCox.Fit(rss!, y, fitted.Name, shift) : null;
        var yeoJohnson = degenerate is null && (nonPositive > 0 || wantsYeoJohnson) ? Remedies.YeoJohnson.Fit(rss!, y, fitted.Name, shift) : null;
        return new RemedyFits(shift, nonPositive, min, max, degenerate, boxCoxReason, boxCox, yeoJohnson, wantsYeoJohnson);
    }

    /// <summary>True when these fits answer a request at <paramref name="shift"/> (a Yeo-Johnson fit asked for is there).</summary>
    public bool Serves(double shift, bool wantsYeoJohnson) => Shift == shift && (!wantsYeoJohnson || YeoJohnsonAsked || NonPositive > 0 || Degenerate is not null);
}
