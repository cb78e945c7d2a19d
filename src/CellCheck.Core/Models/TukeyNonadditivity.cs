using CellCheck.Core.Statistics;

namespace CellCheck.Core.Models;

/// <summary>
/// Tukey's (1949, "One degree of freedom for non-additivity", Biometrics 5, 232-242) test for non-additivity,
/// in its general form for any additive linear model: the squared fitted values, made orthogonal to the model's
/// columns (z = M ŷ²), give the one-degree-of-freedom sum of squares SS_N = (eᵀz)² / zᵀz, and
/// F = SS_N / ((RSS − SS_N) / (ν − 1)) on 1 and ν − 1 degrees of freedom (ν the residual df). Equivalent to the F
/// test of adding ŷ² to the model. Exact under normal errors when the additive model holds.
/// </summary>
public static class TukeyNonadditivity
{
    public static TestOutcome Test(double[,] estimableDesign, LinearFitResult fit)
    {
        ArgumentNullException.ThrowIfNull(estimableDesign);
        ArgumentNullException.ThrowIfNull(fit);
        if (fit.ResidualDf < 2)
        {
            return TestOutcome.NotTestable(NotTestableReason.NoResidualDegreesOfFreedom);
        }

        var squared = fit.Fitted.Select(v => v * v).ToArray();
        var scale = SumOfSquares(squared);
        var z = LinearFit.Fit(estimableDesign, squared).Residuals;
        return FromProjection(fit.Residuals, z, scale, fit.ResidualSumOfSquares, fit.ResidualDf);
    }

    /// <summary>The same test for a fit given by its residualizing map (the absorbed cells-plus-blocks fit), with the
    /// fitted values taken as value minus residual.</summary>
    internal static TestOutcome Test(double[] residuals, double[] values, double rss, int residualDf, CellBlockFit fit)
    {
        if (residualDf < 2)
        {
            return TestOutcome.NotTestable(NotTestableReason.NoResidualDegreesOfFreedom);
        }

        // ŷ² is read on demand and z = M ŷ² handed over value by value: the sums of the stored-array route, in the
        // same order, without an array as long as the data
        var squared = new FittedSquares(values, residuals);
        var scale = 0.0;
        for (var i = 0; i < values.Length; i++)
        {
            var v = squared[i];
            scale += v * v;
        }

        var sums = new ProjectionSums(residuals);
        fit.Residualize(squared, ref sums);
        return FromSums(sums.Ez, sums.Zz, scale, rss, residualDf);
    }

    private static double SumOfSquares(double[] values)
    {
        var sum = 0.0;
        foreach (var v in values)
        {
            sum += v * v;
        }

        return sum;
    }

    /// <param name="scale">Σ (ŷ²)², the size of the squared fitted values before projection.</param>
    private static TestOutcome FromProjection(double[] residuals, double[] z, double scale, double rss, int residualDf)
    {
        var ez = 0.0;
        var zz = 0.0;
        for (var i = 0; i < z.Length; i++)
        {
            ez += residuals[i] * z[i];
            zz += z[i] * z[i];
        }

        return FromSums(ez, zz, scale, rss, residualDf);
    }

    private static TestOutcome FromSums(double ez, double zz, double scale, double rss, int residualDf)
    {
        if (!(zz > 1e-20 * scale) || !(rss > 0))
        {
            return TestOutcome.NotTestable(NotTestableReason.DegenerateWithinGroups);
        }

        var ssn = ez * ez / zz;
        var df2 = residualDf - 1;
        var f = ssn / Math.Max(0, (rss - ssn) / df2);
        return new TestOutcome(f, UpperTail.F(f, 1, df2), 1, df2);
    }
}
