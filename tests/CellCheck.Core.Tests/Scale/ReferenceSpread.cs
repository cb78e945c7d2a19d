namespace CellCheck.Core.Tests.Scale;

/// <summary>
/// The one-way ANOVA F and the spread tests built on it, written from their textbook definitions with compensated
/// sums and no production code. Callers pass only groups of two or more values (those that take part).
/// </summary>
internal static class ReferenceSpread
{
    /// <summary>
    /// F = [Σ n_g (ȳ_g − ȳ)² / (k − 1)] / [Σ_g Σ_i (y_gi − ȳ_g)² / (N − k)] (Fisher 1925), referred to F(k − 1, N − k).
    /// </summary>
    public static ReferenceOutcome OneWayF(IReadOnlyList<double[]> groups)
    {
        var all = groups.SelectMany(g => g).ToArray();
        var grand = ReferenceCells.CarefulMean(all);
        var between = default(CompensatedSum);
        var within = default(CompensatedSum);
        foreach (var g in groups)
        {
            var mean = ReferenceCells.CarefulMean(g);
            between.Add(g.Length * (mean - grand) * (mean - grand));
            foreach (var y in g)
            {
                within.Add((y - mean) * (y - mean));
            }
        }

        double df1 = groups.Count - 1;
        double df2 = all.Length - groups.Count;
        var f = between.Value / df1 / (within.Value / df2);
        return new ReferenceOutcome(f, ReferenceTails.F(f, df1, df2), df1, df2);
    }

    /// <summary>Levene (1960): the one-way F on |y − ȳ_g|.</summary>
    public static ReferenceOutcome Levene(IReadOnlyList<double[]> groups) =>
        OneWayF(groups.Select(g => Deviations(g, ReferenceCells.CarefulMean(g))).ToList());

    /// <summary>Brown &amp; Forsythe (1974): the one-way F on |y − median_g|.</summary>
    public static ReferenceOutcome BrownForsythe(IReadOnlyList<double[]> groups) =>
        OneWayF(groups.Select(g => Deviations(g, Median(g))).ToList());

    /// <summary>
    /// Hines &amp; O'Hara Hines (2000): as Brown-Forsythe, with the one deviation that is zero by construction (the median
    /// itself, in a group of odd size) left out of each odd-sized group.
    /// </summary>
    public static ReferenceOutcome BrownForsytheZerosRemoved(IReadOnlyList<double[]> groups) =>
        OneWayF(groups.Select(g =>
        {
            var deviations = Deviations(g, Median(g)).ToList();
            if (g.Length % 2 == 1)
            {
                deviations.Remove(0.0);
            }

            return deviations.ToArray();
        }).ToList());

    /// <summary>
    /// Bartlett (1937): K² = [ν ln s²_p − Σ ν_g ln s²_g] / C with ν_g = n_g − 1, ν = Σ ν_g, s²_p = Σ ν_g s²_g / ν and
    /// C = 1 + (Σ 1/ν_g − 1/ν) / (3(k − 1)), referred to chi-square with k − 1 degrees of freedom.
    /// </summary>
    public static ReferenceOutcome Bartlett(IReadOnlyList<double[]> groups)
    {
        var variances = groups.Select(Variance).ToArray();
        var nu = groups.Sum(g => g.Length - 1.0);
        var pooledSs = default(CompensatedSum);
        var logs = default(CompensatedSum);
        var reciprocals = default(CompensatedSum);
        for (var g = 0; g < groups.Count; g++)
        {
            var nuG = groups[g].Length - 1.0;
            pooledSs.Add(nuG * variances[g]);
            logs.Add(nuG * Math.Log(variances[g]));
            reciprocals.Add(1.0 / nuG);
        }

        var k = groups.Count;
        var correction = 1.0 + ((reciprocals.Value - (1.0 / nu)) / (3.0 * (k - 1)));
        var k2 = ((nu * Math.Log(pooledSs.Value / nu)) - logs.Value) / correction;
        return new ReferenceOutcome(k2, ReferenceTails.ChiSquare(k2, k - 1), k - 1);
    }

    /// <summary>The median: the middle value of the sorted values, or the mean of the two middle values.</summary>
    public static double Median(double[] x)
    {
        var sorted = x.Order().ToArray();
        var mid = sorted.Length / 2;
        return sorted.Length % 2 == 1 ? sorted[mid] : 0.5 * (sorted[mid - 1] + sorted[mid]);
    }

    /// <summary>Sample variance, divisor n − 1, about the careful mean.</summary>
    public static double Variance(double[] x)
    {
        var mean = ReferenceCells.CarefulMean(x);
        var squares = default(CompensatedSum);
        foreach (var v in x)
        {
            squares.Add((v - mean) * (v - mean));
        }

        return squares.Value / (x.Length - 1);
    }

    private static double[] Deviations(double[] g, double centre) => g.Select(y => Math.Abs(y - centre)).ToArray();
}
