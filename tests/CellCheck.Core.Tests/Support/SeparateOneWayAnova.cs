using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Support;

/// <summary>
/// The one-way ANOVA table computed straight from the values in one loop over the groups (group means computed twice),
/// as it was before the table was split into per-group parts: the reference the split must equal bit for bit.
/// </summary>
internal static class SeparateOneWayAnova
{
    public static (double SsBetween, double SsWithin, double F, double P, int DfBetween, int DfWithin) Compute(GroupedValues groups)
    {
        var k = 0;
        var n = 0;
        var origin = double.NaN;
        var shiftedTotal = 0.0;
        var ssWithin = 0.0;
        for (var g = 0; g < groups.GroupCount; g++)
        {
            var y = groups.Group(g);
            if (y.IsEmpty)
            {
                continue;
            }

            var mean = Descriptive.Mean(y);
            if (k == 0)
            {
                origin = mean;
            }

            shiftedTotal += y.Length * (mean - origin);
            ssWithin += OneWayAnova.CompensatedSumOfSquares(y, mean); // the part the split did not change
            k++;
            n += y.Length;
        }

        var grandMean = origin + (shiftedTotal / n);
        var ss = 0.0;
        var comp = 0.0;
        for (var g = 0; g < groups.GroupCount; g++)
        {
            var y = groups.Group(g);
            if (!y.IsEmpty)
            {
                var d = Descriptive.Mean(y) - grandMean;
                ss += y.Length * d * d;
                comp += y.Length * d;
            }
        }

        var ssBetween = Math.Max(0.0, ss - (comp * comp / n));
        var (dfBetween, dfWithin) = (k - 1, n - k);
        var msBetween = ssBetween / dfBetween;
        var msWithin = ssWithin / dfWithin;
        var f = msWithin > 0 ? msBetween / msWithin : msBetween > 0 ? double.PositiveInfinity : double.NaN;
        return (ssBetween, ssWithin, f, UpperTail.F(f, dfBetween, dfWithin), dfBetween, dfWithin);
    }
}
