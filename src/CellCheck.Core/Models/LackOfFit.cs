using CellCheck.Core.Statistics;

namespace CellCheck.Core.Models;

/// <summary>
/// The lack-of-fit F test (Fisher 1922; see Draper &amp; Smith 1998, Applied Regression Analysis, section 2.1): the
/// residual sum of squares of the declared model splits into pure error (variation among rows with identical
/// settings of every factor and block) and lack of fit; F = (SS_LOF / ν_LOF) / (SS_PE / ν_PE).
/// Not testable without pure error (no replicated settings) or when the model is already saturated in the settings.
/// </summary>
public static class LackOfFit
{
    /// <param name="y">Responses in the fit's row order.</param>
    /// <param name="setting">Index of the identical-settings group of each row.</param>
    public static TestOutcome Test(LinearFitResult fit, ReadOnlySpan<double> y, ReadOnlySpan<int> setting)
    {
        ArgumentNullException.ThrowIfNull(fit);
        return Test(fit.ResidualDf, fit.ResidualSumOfSquares, y, setting);
    }

    /// <summary>The test for any fit given by its residual degrees of freedom and residual sum of squares.</summary>
    public static TestOutcome Test(int residualDf, double residualSumOfSquares, ReadOnlySpan<double> y, ReadOnlySpan<int> setting)
    {
        var groups = 0;
        foreach (var g in setting)
        {
            groups = Math.Max(groups, g + 1);
        }

        var sums = new double[groups];
        var counts = new int[groups];
        for (var i = 0; i < y.Length; i++)
        {
            sums[setting[i]] += y[i];
            counts[setting[i]]++;
        }

        var pure = 0.0;
        for (var i = 0; i < y.Length; i++)
        {
            var d = y[i] - (sums[setting[i]] / counts[setting[i]]);
            pure += d * d;
        }

        var used = counts.Count(c => c > 0);
        var dfPure = y.Length - used;
        var dfLack = residualDf - dfPure;
        if (dfPure < 1 || dfLack < 1)
        {
            return TestOutcome.NotTestable(dfPure < 1 ? NotTestableReason.NoPureError : NotTestableReason.SaturatedModel);
        }

        if (!(pure > 0))
        {
            return TestOutcome.NotTestable(NotTestableReason.ZeroSpread);
        }

        var lack = Math.Max(0, residualSumOfSquares - pure);
        var f = lack / dfLack / (pure / dfPure);
        return new TestOutcome(f, UpperTail.F(f, dfLack, dfPure), dfLack, dfPure);
    }
}
