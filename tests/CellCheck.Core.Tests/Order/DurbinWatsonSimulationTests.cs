using CellCheck.Core.Order;
using MathNet.Numerics.Distributions;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.Random;

namespace CellCheck.Core.Tests.Order;

public sealed class DurbinWatsonSimulationTests
{
    private const int Draws = 20_000;

    [Fact]
    public void Simulated_statistics_of_projected_normal_errors_follow_the_exact_distribution()
    {
        // Brute force: d of e = Mz for z ~ N(0, I₁₆), M the residual projector of the 2⁴ factorial (n = 16, p = 5).
        var x = OrderFixtures.Factorial16();
        var distribution = new DurbinWatsonDistribution(ProjectedDifference.FromDesign(x));
        var d = SimulateStatistics(x, seed: 20240611);

        foreach (var d0 in new[] { 1.5, 2.0, 2.5, 3.0 })
        {
            // the empirical proportion is binomial: within 3 standard errors of the exact value unless the integration
            // (or the eigenvalues) were wrong, a band a correct method misses with probability 0.003 per point.
            var exact = distribution.ExactCdf(d0).Probability;
            var empirical = d.Count(v => v <= d0) / (double)Draws;
            var se = Math.Sqrt(exact * (1 - exact) / Draws);
            Assert.True(Math.Abs(empirical - exact) <= 3 * se, $"d0 {d0}: empirical {empirical}, exact {exact}, se {se:E2}");
        }
    }

    [Fact]
    public void Simulated_mean_and_variance_of_d_agree_with_the_exact_moments()
    {
        var x = OrderFixtures.Factorial16();
        var distribution = new DurbinWatsonDistribution(ProjectedDifference.FromDesign(x));
        var d = SimulateStatistics(x, seed: 77);

        var mean = d.Average();
        var variance = d.Sum(v => (v - mean) * (v - mean)) / (Draws - 1);
        var fourth = d.Sum(v => Math.Pow(v - mean, 4)) / Draws;

        // Standard errors of the simulation: sd/√N for the mean, √((μ₄ − σ⁴)/N) for the variance. We allow three of
        // them, not one: a one-standard-error band is missed by about a third of seeds even when the formula is right.
        var meanSe = Math.Sqrt(variance / Draws);
        var varianceSe = Math.Sqrt((fourth - (variance * variance)) / Draws);
        Assert.True(Math.Abs(mean - distribution.Mean) <= 3 * meanSe, $"mean {mean} vs {distribution.Mean}, se {meanSe:E2}");
        Assert.True(Math.Abs(variance - distribution.Variance) <= 3 * varianceSe, $"variance {variance} vs {distribution.Variance}, se {varianceSe:E2}");
        // E[d] differs from 2 for this design by far more than the simulation error (R: 1.8636363636363649)
        Assert.True(Math.Abs(2 - mean) > 20 * meanSe);
    }

    private static double[] SimulateStatistics(double[,] x, int seed)
    {
        var random = new Xoshiro256StarStar(seed);
        var q = Matrix<double>.Build.DenseOfArray(x).QR().Q.SubMatrix(0, x.GetLength(0), 0, x.GetLength(1));
        var d = new double[Draws];
        var z = new double[x.GetLength(0)];
        for (var k = 0; k < Draws; k++)
        {
            for (var i = 0; i < z.Length; i++)
            {
                z[i] = Normal.Sample(random, 0, 1);
            }

            var zv = Vector<double>.Build.DenseOfArray(z);
            var e = zv - (q * (q.TransposeThisAndMultiply(zv)));
            d[k] = DurbinWatson.Statistic(e.ToArray());
        }

        return d;
    }
}
