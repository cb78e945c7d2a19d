using CellCheck.Core.Analysis;
using CellCheck.Core.Data;
using CellCheck.Core.Remedies;

namespace CellCheck.Core.Tests.Remedies;

/// <summary>The advice's likelihood fits run alongside the checks of a large response give the advice the remedy step gives on its own.</summary>
public sealed class EarlyRemedyTests
{
    [Fact]
    public void Fits_made_alongside_the_checks_give_the_same_advice_as_fits_made_afterwards()
    {
        const int n = ResponseAnalyzer.EarlyRemedyRows + 5_000;
        var random = new Random(17);
        var a = new int[n];
        var b = new int[n];
        var y = new double[n];
        for (var i = 0; i < n; i++)
        {
            a[i] = random.Next(4);
            b[i] = random.Next(5);
            y[i] = Math.Round((10 + (3 * a[i]) + b[i]) * Math.Exp(0.2 * Math.Sqrt(-2 * Math.Log(1 - random.NextDouble())) * Math.Cos(2 * Math.PI * random.NextDouble())), 3);
        }

        var data = new DesignData(
            [new FactorColumn("a", ["a1", "a2", "a3", "a4"], a), new FactorColumn("b", ["b1", "b2", "b3", "b4", "b5"], b)],
            [new ResponseColumn("y", null, 0, y)],
            Enumerable.Range(2, n).ToArray(),
            [[]]);
        var options = new AnalysisOptions();
        var early = ResponseAnalyzer.Analyze(data, 0, options);
        var late = ResponseAnalyzer.Analyze(data, 0, options with { EarlyRemedy = false });
        Assert.NotNull(early.RemedyFits);
        Assert.Null(late.RemedyFits);
        var fromEarly = RemedyAnalyzer.Analyze(data, 0, options, null, early);
        var fromLate = RemedyAnalyzer.Analyze(data, 0, options, null, late);
        Assert.Equal(fromLate.BoxCox!.Lambda, fromEarly.BoxCox!.Lambda);
        Assert.Equal(fromLate.BoxCox.CiLower, fromEarly.BoxCox.CiLower);
        Assert.Equal(fromLate.BoxCox.CiUpper, fromEarly.BoxCox.CiUpper);
        Assert.Equal(fromLate.Recommended, fromEarly.Recommended);
        Assert.Equal(fromLate.Notes, fromEarly.Notes);
    }
}
