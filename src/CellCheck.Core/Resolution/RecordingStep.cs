using CellCheck.Core.Statistics;

namespace CellCheck.Core.Resolution;

/// <summary>
/// Estimates the recording step of a response: with values written to at most d decimals, every value is an integer
/// number of units 10⁻ᵈ; the step is the greatest common divisor of the differences between values, in those units.
/// Ties are counted within cells (identical values of one cell).
/// </summary>
public static class RecordingStep
{
    /// <summary>2^53: the largest count of units below which every integer is exact in a double.</summary>
    private const double MaxExactUnits = 9007199254740992.0;

    public static ResolutionSummary Summarize(GroupedValues cells, int? decimals, double residualSd)
    {
        ArgumentNullException.ThrowIfNull(cells);
        double? step = null;
        if (decimals is { } d && d <= 12 && cells.Count > 1)
        {
            var unit = Math.Pow(10, -d);
            long divisor = 0;
            var first = Math.Round(cells.Values[0] / unit);
            var exact = true;
            foreach (var v in cells.Values)
            {
                var scaled = Math.Round(v / unit - first);
                if (!(Math.Abs(scaled) < MaxExactUnits))
                {
                    // Beyond 2^53 units a double no longer holds every integer: the step cannot be read from the values.
                    exact = false;
                    break;
                }

                // once the divisor is one it stays one: only the exactness of the remaining values is left to check
                divisor = divisor == 1 ? 1 : Gcd(divisor, Math.Abs((long)scaled));
            }

            step = exact && divisor > 0 ? divisor * unit : null;
        }

        var tied = TiedValues(cells);
        var tiedShare = cells.Count == 0 ? 0 : (double)tied / cells.Count;
        double? ratio = step is { } s && residualSd > 0 ? s / residualSd : null;
        var coarse = (ratio ?? 0) >= ResolutionSummary.CoarseStepToSd || tiedShare >= ResolutionSummary.CoarseTiedShare;
        return new ResolutionSummary(step, tiedShare, ratio, coarse);
    }

    /// <summary>Values equal to another value of their cell (<see cref="TieCounter"/>), ranges of cells side by side on
    /// large data (a count, so the order of the cells does not matter).</summary>
    private static int TiedValues(GroupedValues cells)
    {
        var tied = 0;
        GroupChunks.ForEach(cells.Starts, (first, end) =>
        {
            var counter = new TieCounter(GroupChunks.LargestSize(cells.Starts, first, end));
            var count = 0;
            for (var c = first; c < end; c++)
            {
                count += counter.Count(cells.Group(c));
            }

            Interlocked.Add(ref tied, count);
        });
        return tied;
    }

    private static long Gcd(long a, long b)
    {
        while (b != 0)
        {
            (a, b) = (b, a % b);
        }

        return a;
    }
}
