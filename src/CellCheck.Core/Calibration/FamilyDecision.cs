using CellCheck.Core.Statistics;

namespace CellCheck.Core.Calibration;

/// <summary>
/// The family-wise decision across the assumptions a verdict judges: Holm's (1979) step-down adjustment of the
/// primary p-values, each assumption flagged when its adjusted p is below alpha. This keeps the chance of any false
/// flag on clean data at or below alpha. NaN entries (assumptions that could not be judged) take no part.
/// </summary>
public static class FamilyDecision
{
    public static double[] Adjusted(ReadOnlySpan<double> primaryP) => PValueAdjustment.Adjust(primaryP, AdjustMethod.Holm);

    public static bool AnyFlag(ReadOnlySpan<double> primaryP, double alpha)
    {
        foreach (var p in Adjusted(primaryP))
        {
            if (p < alpha)
            {
                return true;
            }
        }

        return false;
    }
}
