using CellCheck.Core.Analysis;
using CellCheck.Core.Cells;
using CellCheck.Core.Order;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Scale;

/// <summary>
/// The comparisons of CellCheck's report on a <see cref="ScaleDesign"/> with the reference side, one method per group of
/// statistics. Statistics the report does not carry are taken from the public Core method the pipeline uses, on the
/// pipeline's own cells or residuals.
/// </summary>
internal sealed class ReportAgreement(ScaleDesign design, ResponseReport report, ReferenceCells reference, Agreement agreement)
{
    public void CellSizesMeansAndShapes()
    {
        Assert.Equal(design.Values.Length, report.RowsUsed);
        Assert.Equal(reference.Groups.Count, report.Cells.Count);
        var cells = report.Cells.Select(c => (Cell: c, Key: string.Join('|', c.Levels))).ToList();
        Assert.All(cells, c => Assert.Equal(reference.Groups[reference.CellOf(c.Key)].Length, c.Cell.N));
        var moments = cells.Select(c => (c.Cell, c.Key, Moments: ReferenceShape.Moments(reference.Groups[reference.CellOf(c.Key)]))).ToList();
        var origin = design.Data.Responses[0].Origin;

        // the reported mean adds the origin back (ResponseColumn: values are held relative to it)
        agreement.AllEqual("cell mean", moments.Select(m => (m.Key, origin + m.Moments.Mean, m.Cell.Mean)));
        agreement.AllEqual("cell SD", moments.Where(m => m.Cell.N >= 2).Select(m => (m.Key, m.Moments.Sd, m.Cell.Sd)));
        // a cell's skewness or kurtosis near zero is a small difference of large sums (one cell of the 1 000-cell design
        // has g1 = −1.2e-5 with Σ|d³| / |Σ d³| ≈ 10⁵): these are the tightest cell comparisons, still near 1e-10
        agreement.AllEqual("cell skewness", moments.Where(m => m.Cell.N >= 3).Select(m => (m.Key, m.Moments.Skewness, m.Cell.Skewness)));
        agreement.AllEqual("cell excess kurtosis", moments.Where(m => m.Cell.N >= 4).Select(m => (m.Key, m.Moments.Kurtosis, m.Cell.ExcessKurtosis)));
    }

    public void Residuals()
    {
        var rows = report.Rows;
        var sd = reference.ResidualSd;

        // a residual passes through zero, so its difference is measured on the scale of the residual SD, the size
        // every residual check standardises by; studentized residuals are in that unit already (scale 1)
        agreement.AllEqualOnScale("residual (by data-file line)", sd, rows.Lines.Select((line, i) => (line, reference.Residual[line - 2], rows.Residuals[i])));
        agreement.AllEqualOnScale("studentized residual (by data-file line)", 1.0, rows.Lines.Select((line, i) => (line, reference.Studentized[line - 2], rows.Studentized[i]))
            .Where(p => double.IsFinite(p.Item2)));
        agreement.Equal("residual SD", sd, report.Pooled.ResidualSd);
        Assert.Equal(reference.ResidualDf, report.Pooled.ResidualDf);
        Assert.Equal(reference.Studentized.Count(double.IsFinite), report.Pooled.N);
    }

    public void Spread(string name, ReferenceOutcome expected)
    {
        var check = Check(report.Spread.Checks, name);
        agreement.Equal(name + " statistic", expected.Statistic, check.Statistic!.Value);
        Assert.Equal(double.IsNaN(expected.Df2) ? [expected.Df1] : [expected.Df1, expected.Df2], check.Df);
        agreement.Equal(name + " p", expected.P, check.P!.Value);
    }

    public void SdRatio()
    {
        var sds = reference.Replicated.Select(g => Math.Sqrt(ReferenceSpread.Variance(g))).ToArray();
        agreement.Equal("largest to smallest cell SD", sds.Max() / sds.Min(), report.Spread.SdRatio!.Value);
    }

    /// <summary>The report carries no ANOVA table: OneWayAnova on the pipeline's own cells.</summary>
    public void OneWayAnovaF()
    {
        var data = design.Data;
        var table = OneWayAnova.Compute(CellPartition.Build(data.Factors, data.Responses[0].Values).Values);
        var expected = ReferenceSpread.OneWayF(reference.Groups);

        agreement.Equal("ANOVA F", expected.Statistic, table.F);
        Assert.Equal((expected.Df1, expected.Df2), (table.DfBetween, table.DfWithin));
        agreement.Equal("ANOVA p", expected.P, table.P);
    }

    public void PooledMoments()
    {
        var moments = ReferenceShape.Moments(PooledStudentized());
        agreement.Equal("pooled skewness", moments.Skewness, report.Pooled.Skewness);
        agreement.Equal("pooled excess kurtosis", moments.Kurtosis, report.Pooled.ExcessKurtosis);
    }

    public void PooledShapiroWilk()
    {
        var check = Check(report.Pooled.Checks, CheckNames.ShapiroWilk);
        agreement.Equal("pooled Shapiro-Wilk W", ReferenceShapiroWilk.Test(PooledStudentized()).Statistic, check.Statistic!.Value);

        // Royston's p is fitted up to n = 5000 (Royston 1995): above it W is reported without p
        Assert.Equal((null, NotTestableReason.TooManyValues), (check.P, check.Reason));
    }

    public void PooledAndersonDarling() => Pooled(CheckNames.AndersonDarling, ReferenceAndersonDarling.Test(PooledStudentized()));

    public void PooledDagostinoPearson() => Pooled(CheckNames.DagostinoPearson, ReferenceShape.DagostinoPearson(PooledStudentized()));

    public void DurbinWatsonAndLag1()
    {
        var e = reference.ResidualsInRunOrder;
        var reported = Check(report.Order.Checks, CheckNames.DurbinWatson).Statistic;

        // At 10⁶ rows and 1 000 or more cells the exact moments of d need n·p² ≥ 10¹² > OrderChecks.MomentWorkLimit, so
        // the report leaves Durbin-Watson untested; d is then the public statistic on the report's residuals in its run order.
        var d = reported ?? DurbinWatson.Statistic(ReportResidualsInRunOrder());
        agreement.Equal("Durbin-Watson d", ReferenceOrder.DurbinWatson(e), d);
        agreement.Equal("lag-1 autocorrelation", ReferenceOrder.Lag1(e), report.Order.Lag1!.Value);
        Assert.Equal(e.Length, report.Order.Rows);
    }

    public void Runs()
    {
        var expected = ReferenceOrder.Runs(reference.ResidualsInRunOrder);
        var check = Check(report.Order.Checks, CheckNames.Runs);

        Assert.Equal(expected.Statistic, check.Statistic);
        agreement.Equal("runs p", expected.P, check.P!.Value);
    }

    public void Trend()
    {
        var expected = ReferenceOrder.Trend(reference.ResidualsInRunOrder, reference.PositionsInRunOrder);
        var check = Check(report.Order.Checks, CheckNames.Trend);

        agreement.Equal("trend slope", expected.Statistic, check.Statistic!.Value);
        Assert.Equal([expected.Df1], check.Df);
        agreement.Equal("trend p", expected.P, check.P!.Value);
    }

    /// <summary>A within-cell test in every cell of at least <paramref name="minimum"/> values.</summary>
    public void EveryCell(string name, int minimum, Func<double[], ReferenceOutcome> test)
    {
        var pairs = report.Cells.Where(c => c.N >= minimum).Select(c =>
        {
            var key = string.Join('|', c.Levels);
            return (Key: key, Expected: test(reference.Groups[reference.CellOf(key)]), Check: Check(c.Checks, name));
        }).ToList();

        agreement.AllEqual("cell " + name + " statistic", pairs.Select(p => (p.Key, p.Expected.Statistic, p.Check.Statistic!.Value)));
        agreement.AllEqual("cell " + name + " p", pairs.Select(p => (p.Key, p.Expected.P, p.Check.P!.Value)));
    }

    private static CheckResult Check(IEnumerable<CheckResult> checks, string name) => checks.Single(c => c.Check == name);

    private void Pooled(string name, ReferenceOutcome expected)
    {
        var check = Check(report.Pooled.Checks, name);
        agreement.Equal("pooled " + name + " statistic", expected.Statistic, check.Statistic!.Value);
        agreement.Equal("pooled " + name + " p", expected.P, check.P!.Value);
    }

    /// <summary>The reference's studentized residuals of the rows that have one (not in a singleton cell), in row order.</summary>
    private double[] PooledStudentized() => reference.Studentized.Where(double.IsFinite).ToArray();

    /// <summary>The report's residuals of rows with leverage below one, sorted by run position, then by data-file line.</summary>
    private double[] ReportResidualsInRunOrder()
    {
        var rows = report.Rows;
        return Enumerable.Range(0, rows.Residuals.Length).Where(i => rows.Leverage[i] < 1)
            .OrderBy(i => rows.RunOrder![i]).ThenBy(i => rows.Lines[i]).Select(i => rows.Residuals[i]).ToArray();
    }
}
