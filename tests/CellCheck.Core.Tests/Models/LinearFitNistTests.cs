using CellCheck.Core.Models;
using CellCheck.Core.Tests.Support;
using Xunit.Abstractions;

namespace CellCheck.Core.Tests.Models;

public sealed class LinearFitNistTests(ITestOutputHelper output)
{
    internal static double[,] Design(NistRegressionFile file, string name) => name switch
    {
        "Norris" => file.Polynomial(1),
        "Pontius" => file.Polynomial(2),
        "NoInt1" or "NoInt2" => file.Polynomial(1, intercept: false),
        "Longley" => file.InterceptAndPredictors(),
        "Filip" => file.Polynomial(10),
        _ => file.Polynomial(5),
    };

    [Theory]
    [InlineData("Norris", 0, 0, 0)]
    [InlineData("Pontius", 0, 0, 0)]
    [InlineData("NoInt1", 0, 0, 0)]
    [InlineData("NoInt2", 0, 0, 0)]
    [InlineData("Longley", 0, 0, 0)]
    [InlineData("Filip", 0, 0, 0)]
    [InlineData("Wampler1", 0, 0, 0)]
    [InlineData("Wampler2", 0, 0, 0)]
    [InlineData("Wampler3", 0, 0, 0)]
    [InlineData("Wampler4", 0, 0, 0)]
    [InlineData("Wampler5", 0, 0, 0)]
    public void Certified_values_are_reached(string name, double minCoefficients, double minDeviations, double minResidualSd)
    {
        var file = NistRegressionFile.Load(name);
        for (var steps = 0; steps <= 4; steps++)
        {
            LinearFit.RefinementSteps = steps;
            var f = LinearFit.Fit(Design(file, name), file.Y);
            var c = file.CertifiedEstimates.Select((c, j) => Accuracy.Lre(c, f.Coefficients[j])).ToArray();
            var d = file.CertifiedDeviations.Select((c, j) => Accuracy.Lre(c, f.StandardErrors[j])).ToArray();
            output.WriteLine($"STEPS {name} {steps}: coef {c.Min():F2} sd {d.Min():F2} rsd {Accuracy.Lre(file.CertifiedResidualSd, f.ResidualSd):F2}");
        }

        LinearFit.RefinementSteps = 1;
        var fit = LinearFit.Fit(Design(file, name), file.Y);
        output.WriteLine("COEF " + name + " " + string.Join(" ", fit.Coefficients.Select(v => v.ToString("R"))));
        Assert.Empty(fit.Aliased);
        var coefficients = file.CertifiedEstimates.Select((c, j) => Accuracy.Lre(c, fit.Coefficients[j])).ToArray();
        var deviations = file.CertifiedDeviations.Select((c, j) => Accuracy.Lre(c, fit.StandardErrors[j])).ToArray();
        var residualSd = Accuracy.Lre(file.CertifiedResidualSd, fit.ResidualSd);
        output.WriteLine($"LRE {name}: coefficients min {coefficients.Min():F1} [{string.Join(' ', coefficients.Select(v => v.ToString("F1")))}], sd min {deviations.Min():F1} [{string.Join(' ', deviations.Select(v => v.ToString("F1")))}], residual sd {residualSd:F1}");
        Assert.True(coefficients.Min() >= minCoefficients);
        Assert.True(deviations.Min() >= minDeviations);
        Assert.True(residualSd >= minResidualSd);
    }
}
