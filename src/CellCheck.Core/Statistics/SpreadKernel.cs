using System.Runtime.CompilerServices;

namespace CellCheck.Core.Statistics;

/// <summary>
/// The five tests of equal spread (Levene, Brown-Forsythe, Brown-Forsythe with zeros removed, Bartlett,
/// Fligner-Killeen; see each test's type for the method and its reference) computed together: one rescaling and one
/// filter of the groups, one visit of each group for what the tests share (<see cref="SpreadGroupParts"/>), then each
/// test's combination in group order. Each outcome equals the test computed alone, bit for bit: every number is formed
/// by the same operations in the same order; only the groups' independent parts are computed side by side. (The one sum
/// taken in another order, the rounding floor of Levene and Brown-Forsythe, decides only where the sum in order would
/// decide the same: see <see cref="AbsoluteDeviationF"/>.)
/// </summary>
internal static class SpreadKernel
{
    /// <summary>Allowance for rounding in one absolute deviation, in units of ε·(|y| + |centre|).</summary>
    private const double RoundingAllowance = 8.0;

    /// <summary>Unit round-off of double precision, 2⁻⁵³.</summary>
    private const double UnitRoundoff = 1.1102230246251565e-16;

    /// <summary>2⁻²⁰: the relative margin above the groups' sum of the rounding floor that decides without the ordered sum.</summary>
    private const double Margin = 9.5367431640625e-7;

    public static SpreadOutcomes Run(GroupedValues groups, SpreadTests tests)
    {
        ArgumentNullException.ThrowIfNull(groups);
        var part = GroupFilter.AtLeast(SampleGuard.Scaled(groups), 2);
        var obstacle = GroupFilter.DeviationTestObstacle(part);
        var deviationTests = SpreadTests.Levene | SpreadTests.BrownForsythe | SpreadTests.BrownForsytheZerosRemoved;
        var work = part.GroupCount < 2 ? SpreadTests.None : obstacle is null ? tests : tests & ~deviationTests;
        var parts = SpreadGroupParts.Compute(part, work);
        var notTestable = TestOutcome.NotTestable(obstacle ?? NotTestableReason.TooFewGroups);
        return new SpreadOutcomes(
            Asked(tests, SpreadTests.Levene, parts.Levene is { } l ? AbsoluteDeviationF(l, parts.LeveneFloors!, () => RoundingFloors(part, parts).Levene) : notTestable),
            Asked(tests, SpreadTests.BrownForsythe, parts.BrownForsythe is { } b ? AbsoluteDeviationF(b, parts.BrownForsytheFloors!, () => RoundingFloors(part, parts).BrownForsythe) : notTestable),
            Asked(tests, SpreadTests.BrownForsytheZerosRemoved, parts.ZerosRemoved is { } z ? ZerosRemoved(z, part.GroupCount) : notTestable),
            Asked(tests, SpreadTests.Bartlett, parts.SumsOfSquares is { } ss ? Bartlett(part, ss) : TestOutcome.NotTestable(NotTestableReason.TooFewGroups)),
            Asked(tests, SpreadTests.FlignerKilleen, parts.Medians is { } m ? FlignerKilleenScores.Test(part, m, parts.Magnitude) : TestOutcome.NotTestable(NotTestableReason.TooFewGroups)));
    }

    private static TestOutcome? Asked(SpreadTests tests, SpreadTests test, TestOutcome outcome) => (tests & test) != 0 ? outcome : null;

    /// <summary>
    /// The sums over all values, in order, of the squared rounding allowance of each absolute deviation (Levene and
    /// Brown-Forsythe): the within-group sum of squares of the deviations must exceed it for the test to say anything.
    /// </summary>
    private static (double Levene, double BrownForsythe) RoundingFloors(GroupedValues part, SpreadGroupParts parts)
    {
        var levene = 0.0;
        var brownForsythe = 0.0;
        if (parts.LeveneCentres is null && parts.BrownForsytheCentres is null)
        {
            return (levene, brownForsythe);
        }

        var leveneCentres = parts.LeveneCentres ?? new double[part.GroupCount];
        var brownForsytheCentres = parts.BrownForsytheCentres ?? new double[part.GroupCount];
        for (var g = 0; g < part.GroupCount; g++)
        {
            var (lc, bc) = (leveneCentres[g], brownForsytheCentres[g]);
            foreach (var v in part.Group(g))
            {
                var noise = Noise(v, lc);
                levene += noise * noise;
                noise = Noise(v, bc);
                brownForsythe += noise * noise;
            }
        }

        return (levene, brownForsythe);
    }

    /// <summary>The rounding allowance of the absolute deviation of <paramref name="y"/> from a centre c, with
    /// <paramref name="centre"/> = |y₀ + c| (the centre on the scale of the values).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static double Noise(double y, double centre) => RoundingAllowance * UnitRoundoff * (Math.Abs(y) + centre);

    /// <summary>
    /// Levene's or Brown-Forsythe's F from the deviations' ANOVA parts, testable when the within-group sum of squares
    /// exceeds the rounding floor summed over all values in order. The groups' parts of the floor, added in group
    /// order, are that sum in another order: for n non-negative terms either sum is within a factor 1 ± γ of the exact
    /// sum, γ = (n − 1)u / (1 − (n − 1)u) &lt; 2⁻²¹ for n &lt; 2³¹ (Higham 2002, Accuracy and Stability of Numerical
    /// Algorithms, §4.2; additions of non-negative numbers do not underflow), so a sum of squares above the parts' sum by
    /// the factor 1 + 2⁻²⁰ is above the ordered sum too. Only otherwise is the ordered sum formed (one pass over the values).
    /// </summary>
    private static TestOutcome AbsoluteDeviationF(GroupAnovaParts deviations, double[] groupFloors, Func<double> orderedFloor)
    {
        var table = deviations.Table();
        var floor = 0.0;
        foreach (var f in groupFloors)
        {
            floor += f;
        }

        var clearlyAbove = double.IsFinite(floor) && table.SsWithin > floor * (1 + Margin);
        if (!clearlyAbove && !(table.SsWithin > orderedFloor()))
        {
            return TestOutcome.NotTestable(NotTestableReason.DegenerateWithinGroups);
        }

        return new TestOutcome(table.F, table.P, table.DfBetween, table.DfWithin);
    }

    private static TestOutcome ZerosRemoved(GroupAnovaParts kept, int groups)
    {
        var table = kept.Table();
        var statistic = table.SsWithin > 0 && double.IsFinite(table.F) ? table.F : double.NaN;
        if (double.IsNaN(statistic))
        {
            return TestOutcome.NotTestable(NotTestableReason.DegenerateWithinGroups);
        }

        var df1 = groups - 1;
        var df2 = kept.Count - groups;
        return new TestOutcome(statistic, UpperTail.F(statistic, df1, df2), df1, df2);
    }

    private static TestOutcome Bartlett(GroupedValues part, double[] sumsOfSquares)
    {
        var variances = new double[part.GroupCount];
        var k = 0;
        var nu = 0;
        var pooledSs = 0.0;
        var reciprocalSum = 0.0;
        for (var g = 0; g < part.GroupCount; g++)
        {
            var size = part.Size(g);
            var ss = sumsOfSquares[g];
            if (!(ss > 0))
            {
                return TestOutcome.NotTestable(NotTestableReason.ZeroVarianceGroup);
            }

            variances[g] = ss / (size - 1);
            pooledSs += ss;
            reciprocalSum += 1.0 / (size - 1);
            nu += size - 1;
            k++;
        }

        var pooled = pooledSs / nu;
        var numerator = 0.0;
        for (var g = 0; g < part.GroupCount; g++)
        {
            numerator += (part.Size(g) - 1) * Math.Log(pooled / variances[g]);
        }

        var correction = 1.0 + ((reciprocalSum - (1.0 / nu)) / (3.0 * (k - 1)));
        var statistic = Math.Max(0.0, numerator / correction);
        return new TestOutcome(statistic, UpperTail.ChiSquare(statistic, k - 1), k - 1);
    }
}
