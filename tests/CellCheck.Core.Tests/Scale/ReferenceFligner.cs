using MathNet.Numerics.Distributions;

namespace CellCheck.Core.Tests.Scale;

/// <summary>
/// The median-centred Fligner-Killeen test (Fligner &amp; Killeen 1976; Conover, Johnson &amp; Johnson 1981), written
/// from its definition with no production code: every |y − median_g| ranked over all N values with mid-ranks for
/// ties, scored a = Φ⁻¹((1 + r/(N + 1))/2), and X² = Σ n_g (ā_g − ā)² / s²_a with s²_a the variance (divisor
/// N − 1) of all scores, referred to chi-square with k − 1 degrees of freedom.
/// </summary>
/// <remarks>
/// Ties follow CellCheck's documented rule (FlignerKilleen's remarks): deviations within 64 units in the last place of
/// the largest absolute value of the data, measured from the smallest value of a run of sorted deviations, are tied.
/// On data recorded to three decimals, deviations that are equal in decimal differ in binary by a few units in the
/// last place, and an exact-equality rule would rank them by rounding noise.
/// </remarks>
internal static class ReferenceFligner
{
    public static ReferenceOutcome Test(IReadOnlyList<double[]> groups)
    {
        var n = groups.Sum(g => g.Length);
        var magnitude = groups.SelectMany(g => g).Max(Math.Abs);
        var tolerance = 64 * (Math.BitIncrement(magnitude) - magnitude);
        var deviations = new double[n];
        var groupOf = new int[n];
        var at = 0;
        for (var g = 0; g < groups.Count; g++)
        {
            var median = ReferenceSpread.Median(groups[g]);
            foreach (var y in groups[g])
            {
                groupOf[at] = g;
                deviations[at++] = Math.Abs(y - median);
            }
        }

        var order = Enumerable.Range(0, n).ToArray();
        Array.Sort((double[])deviations.Clone(), order);
        var scores = new double[n];
        for (var start = 0; start < n;)
        {
            var end = start + 1;
            while (end < n && deviations[order[end]] - deviations[order[start]] <= tolerance)
            {
                end++;
            }

            var rank = (start + 1 + end) / 2.0; // the mean of ranks start + 1 .. end
            for (var j = start; j < end; j++)
            {
                scores[order[j]] = Normal.InvCDF(0, 1, (1.0 + (rank / (n + 1))) / 2.0);
            }

            start = end;
        }

        var grand = CompensatedSum.Of(scores) / n;
        var groupSums = new CompensatedSum[groups.Count];
        var total = default(CompensatedSum);
        for (var i = 0; i < n; i++)
        {
            groupSums[groupOf[i]].Add(scores[i]);
            total.Add((scores[i] - grand) * (scores[i] - grand));
        }

        var between = default(CompensatedSum);
        for (var g = 0; g < groups.Count; g++)
        {
            var mean = groupSums[g].Value / groups[g].Length;
            between.Add(groups[g].Length * (mean - grand) * (mean - grand));
        }

        var x2 = between.Value / (total.Value / (n - 1));
        return new ReferenceOutcome(x2, ReferenceTails.ChiSquare(x2, groups.Count - 1), groups.Count - 1);
    }
}
