using System.Buffers;

namespace CellCheck.Core.Statistics;

/// <summary>
/// What the spread tests need from each group, from one visit of the group (groups in parallel on large data, each
/// writing only its own slots): the sum Σ (y − y₀) about the first value gives both the group mean (Bartlett's sum of
/// squares) and Levene's centre; one selection gives the middle order statistics, hence both the median (Brown-Forsythe
/// with zeros removed, Fligner-Killeen) and the median of the values less y₀ (Brown-Forsythe: subtracting y₀ keeps the
/// order, so its order statistics are those of the values less y₀). The absolute deviations of each test are
/// formed in a group-sized buffer and summarised at once, never held for all values. Every number is computed by the
/// same operations, in the same order, as the test computed alone on the values (see the tests' own types).
/// </summary>
internal sealed class SpreadGroupParts
{
    private const int PoolLimit = 1 << 16;

    private SpreadGroupParts(int groups, SpreadTests tests)
    {
        var has = (SpreadTests t) => (tests & t) != 0;
        Levene = has(SpreadTests.Levene) ? new GroupAnovaParts(groups) : null;
        LeveneCentres = has(SpreadTests.Levene) ? new double[groups] : null;
        LeveneFloors = has(SpreadTests.Levene) ? new double[groups] : null;
        BrownForsythe = has(SpreadTests.BrownForsythe) ? new GroupAnovaParts(groups) : null;
        BrownForsytheCentres = has(SpreadTests.BrownForsythe) ? new double[groups] : null;
        BrownForsytheFloors = has(SpreadTests.BrownForsythe) ? new double[groups] : null;
        ZerosRemoved = has(SpreadTests.BrownForsytheZerosRemoved) ? new GroupAnovaParts(groups) : null;
        SumsOfSquares = has(SpreadTests.Bartlett) ? new double[groups] : null;
        Medians = has(SpreadTests.FlignerKilleen) ? new double[groups] : null;
    }

    /// <summary>Levene: the absolute deviations from the group means, by group.</summary>
    public GroupAnovaParts? Levene { get; }

    /// <summary>Levene: |y₀ + centre| of each group, for the rounding floor.</summary>
    public double[]? LeveneCentres { get; }

    /// <summary>Levene: each group's part of the rounding floor (see <see cref="SpreadKernel.Noise"/>).</summary>
    public double[]? LeveneFloors { get; }

    /// <summary>Brown-Forsythe: the absolute deviations from the group medians, by group.</summary>
    public GroupAnovaParts? BrownForsythe { get; }

    /// <summary>Brown-Forsythe: |y₀ + centre| of each group, for the rounding floor.</summary>
    public double[]? BrownForsytheCentres { get; }

    /// <summary>Brown-Forsythe: each group's part of the rounding floor (see <see cref="SpreadKernel.Noise"/>).</summary>
    public double[]? BrownForsytheFloors { get; }

    /// <summary>Brown-Forsythe with zeros removed: the kept deviations, by group.</summary>
    public GroupAnovaParts? ZerosRemoved { get; }

    /// <summary>Bartlett: each group's sum of squared deviations about its mean.</summary>
    public double[]? SumsOfSquares { get; }

    /// <summary>Fligner-Killeen: each group's median.</summary>
    public double[]? Medians { get; }

    /// <summary>The largest absolute value of all values.</summary>
    public double Magnitude { get; private set; }

    /// <summary>The parts of every group of <paramref name="part"/> (each of at least two values) for <paramref name="tests"/>.</summary>
    public static SpreadGroupParts Compute(GroupedValues part, SpreadTests tests)
    {
        var parts = new SpreadGroupParts(part.GroupCount, tests);
        var magnitudes = new List<double>();
        var gate = new object();
        GroupChunks.ForEach(part.Starts, (first, end) =>
        {
            var size = GroupChunks.LargestSize(part.Starts, first, end);
            var pooled = size <= PoolLimit;
            var select = pooled ? ArrayPool<double>.Shared.Rent(size) : new double[size];
            var deviations = pooled ? ArrayPool<double>.Shared.Rent(size) : new double[size];
            var magnitude = 0.0;
            for (var g = first; g < end; g++)
            {
                magnitude = Math.Max(magnitude, parts.Visit(part.Group(g), g, select, deviations));
            }

            if (pooled)
            {
                ArrayPool<double>.Shared.Return(select);
                ArrayPool<double>.Shared.Return(deviations);
            }

            lock (gate)
            {
                magnitudes.Add(magnitude); // a maximum: the same whatever the order of the ranges
            }
        });
        foreach (var m in magnitudes)
        {
            parts.Magnitude = Math.Max(parts.Magnitude, m);
        }

        return parts;
    }

    /// <summary>Fills group <paramref name="g"/>'s slots; returns the group's largest absolute value.</summary>
    private double Visit(ReadOnlySpan<double> y, int g, double[] select, double[] buffer)
    {
        var n = y.Length;
        var y0 = y[0];
        var deviations = buffer.AsSpan(0, n);
        if (Levene is not null || SumsOfSquares is not null)
        {
            var sum = 0.0;
            foreach (var v in y)
            {
                sum += v - y0;
            }

            if (SumsOfSquares is not null)
            {
                SumsOfSquares[g] = Descriptive.SumOfSquares(y, y0 + (sum / n));
            }

            if (Levene is not null)
            {
                // the mean of y − y₀ (whose first value is 0): 0 + Σ (y − y₀) / n
                var c = 0.0 + (sum / n);
                LeveneCentres![g] = Math.Abs(y0 + c);
                LeveneFloors![g] = AbsoluteDeviations(y, y0, c, LeveneCentres[g], deviations);
                Levene.Set(g, deviations);
            }
        }

        if (BrownForsythe is not null || ZerosRemoved is not null || Medians is not null)
        {
            var (lower, upper) = Descriptive.MiddleOrderStatistics(y, select);
            var odd = n % 2 == 1;
            var median = odd ? upper : 0.5 * (lower + upper);
            if (BrownForsythe is not null)
            {
                // the median of y − y₀ (up to the sign of a zero, which no absolute deviation sees)
                var c = odd ? upper - y0 : 0.5 * ((lower - y0) + (upper - y0));
                BrownForsytheCentres![g] = Math.Abs(y0 + c);
                BrownForsytheFloors![g] = AbsoluteDeviations(y, y0, c, BrownForsytheCentres[g], deviations);
                BrownForsythe.Set(g, deviations);
            }

            if (ZerosRemoved is not null)
            {
                ZerosRemoved.Set(g, deviations[..BrownForsytheZerosRemoved.KeptDeviations(y, median, deviations)]);
            }

            if (Medians is not null)
            {
                Medians[g] = median;
            }
        }

        var magnitude = 0.0;
        if (Medians is null)
        {
            return magnitude;
        }

        foreach (var v in y)
        {
            magnitude = Math.Max(magnitude, Math.Abs(v));
        }

        return magnitude;
    }

    /// <summary>|(y − y₀) − c| for each value; returns the group's part of the rounding floor, Σ noise² in order.</summary>
    private static double AbsoluteDeviations(ReadOnlySpan<double> y, double y0, double c, double centre, Span<double> deviations)
    {
        var floor = 0.0;
        for (var i = 0; i < y.Length; i++)
        {
            deviations[i] = Math.Abs((y[i] - y0) - c);
            var noise = SpreadKernel.Noise(y[i], centre);
            floor += noise * noise;
        }

        return floor;
    }
}
