using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Statistics;

/// <summary>
/// Check values are from /work/shared/reference/README.md unless a command is given. Tolerances: W to 1e-9 relative
/// against R 4.2.2 (the same approximation in double precision; the normal quantile routines differ in the last
/// bits); p to 1e-7 relative against R (p amplifies W's last-bit differences through log(1 − W)).
/// </summary>
public sealed class ShapiroWilkTests
{
    private const double WTolerance = 1e-9;
    private const double PTolerance = 1e-7;

    [Theory]
    // Royston (1992) worked example; full precision: R 4.2.2 shapiro.test
    [InlineData(new[] { 48.4, 49.0, 59.5, 59.6, 60.7, 88.8, 98.2, 109.4, 169.1, 227.1 }, 0.807828817767, 0.018046588422287)]
    // Shapiro & Wilk (1965) weights of 11 men; R 4.2.2 shapiro.test
    [InlineData(new[] { 148.0, 154, 158, 160, 161, 162, 166, 170, 182, 195, 236 }, 0.788814694835387, 0.00670381405650293)]
    // scipy test_morestats.py TestShapiro.test_basic, values from R
    [InlineData(new[] { 0.11, 7.87, 4.61, 10.14, 7.95, 3.14, 0.46, 4.43, 0.21, 4.75, 0.71, 1.52, 3.24, 0.93, 0.42, 4.97, 9.53, 4.55, 0.47, 6.66 }, 0.90047287931756, 0.04208957522226)]
    [InlineData(new[] { 1.36, 1.14, 2.92, 2.55, 1.46, 1.06, 5.27, -1.11, 3.48, 1.10, 0.88, -0.51, 1.46, 0.52, 6.20, 1.69, 0.08, 3.67, 2.81, 3.49 }, 0.95902694603234, 0.5245979304707)]
    // scipy test_basic2 (Shapiro & Wilk 1965 data, precision from R)
    [InlineData(new[] { 0.139, 0.157, 0.175, 0.256, 0.344, 0.413, 0.503, 0.577, 0.614, 0.655, 0.954, 1.392, 1.557, 1.648, 1.690, 1.994, 2.174, 2.206, 3.245, 3.510, 3.571, 4.354, 4.980, 6.084, 8.351 }, 0.83466627531817, 0.000913490481813)]
    // scipy test_length_3_gh18322, from R (n = 3, exact p)
    [InlineData(new[] { -0.7746653110021126, -0.4344432067942129, 1.8157053280290931 }, 0.84658770645509, 0.2313666489882)]
    // R 4.2.2 shapiro.test(c(1, 2, 4))
    [InlineData(new[] { 1.0, 2, 4 }, 0.964285714285714, 0.636886845028963)]
    // R 4.2.2 shapiro.test(c(1, 2, 3, 10))
    [InlineData(new[] { 1.0, 2, 3, 10 }, 0.8068856645677, 0.115152981754537)]
    // R 4.2.2 shapiro.test(c(1:10, 30)): n = 11, last n of the small-sample branch
    [InlineData(new[] { 1.0, 2, 3, 4, 5, 6, 7, 8, 9, 10, 30 }, 0.69945306061813, 0.000460244429626618)]
    // R 4.2.2 shapiro.test(c(1:11, 30)): n = 12, first n of the large-sample branch
    [InlineData(new[] { 1.0, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 30 }, 0.732129826832628, 0.00175008130243658)]
    // R 4.2.2 shapiro.test on a sample with ties
    [InlineData(new[] { -1.7, -1, -1, -.73, -.61, -.5, -.24, .45, .62, .81, 1 }, 0.942552494006364, 0.550954764437251)]
    // scipy test_gh14462 (tiny range), from R
    [InlineData(new[] { 0, 3.39996924e-08, -6.35166875e-09 }, 0.86468431705371, 0.2805581751566)]
    // R 4.2.2: shapiro.test(c(10, 12, 11, 15)) -> W 0.92708167923677298, p 0.57735490188009753
    [InlineData(new[] { 10.0, 12, 11, 15 }, 0.92708167923677298, 0.57735490188009753)]
    // R 4.2.2: shapiro.test(c(3.1, 4.7, 2.2, 9.8, 5.0)) -> W 0.87811995871300874, p 0.3008782212619579
    [InlineData(new[] { 3.1, 4.7, 2.2, 9.8, 5.0 }, 0.87811995871300874, 0.3008782212619579)]
    // R 4.2.2: shapiro.test(c(0.5, 1.5, 1.6, 2.9, 3.3, 8.1)) -> W 0.82920256418295646, p 0.10582903688302865
    [InlineData(new[] { 0.5, 1.5, 1.6, 2.9, 3.3, 8.1 }, 0.82920256418295646, 0.10582903688302865)]
    public void Shapiro_wilk_matches_r_on_published_and_small_samples(double[] sample, double w, double p)
    {
        var outcome = ShapiroWilk.Test(sample);

        Assert.True(outcome.IsTestable);
        Close.Relative(w, outcome.Statistic, WTolerance);
        Close.Relative(p, outcome.P, PTolerance);
    }

    [Fact]
    public void Shapiro_wilk_matches_royston_1992_worked_example_to_the_printed_digits()
    {
        // Royston (1992) prints W = 0.8078 and p = 0.018: half a unit in the last printed digit
        var outcome = ShapiroWilk.Test(ReferenceSamples.Royston1992);

        Close.Absolute(0.8078, outcome.Statistic, 0.00005);
        Close.Absolute(0.018, outcome.P, 0.0005);
    }

    [Fact]
    public void Shapiro_wilk_matches_r_on_all_100_gear_diameters()
    {
        // R 4.2.2 shapiro.test(GEAR diameters)
        var outcome = ShapiroWilk.Test(ReferenceSamples.Gear);

        Close.Relative(0.962242685305182, outcome.Statistic, WTolerance);
        Close.Relative(0.00582974683634899, outcome.P, PTolerance);
    }

    [Fact]
    public void Shapiro_wilk_matches_r_on_one_way_residuals_of_insect_sprays()
    {
        // R 4.2.2 shapiro.test(residuals(lm(count ~ spray, InsectSprays)))
        var outcome = ShapiroWilk.Test(ReferenceSamples.OneWayResiduals(ReferenceSamples.InsectSprays, 12));

        Close.Relative(0.960058542809377, outcome.Statistic, WTolerance);
        Close.Relative(0.0222598867824892, outcome.P, PTolerance);
    }

    [Fact]
    public void Shapiro_wilk_matches_r_on_one_way_residuals_of_plant_growth()
    {
        // R 4.2.2 shapiro.test(residuals(lm(weight ~ group, PlantGrowth)))
        var outcome = ShapiroWilk.Test(ReferenceSamples.OneWayResiduals(ReferenceSamples.PlantGrowth, 10));

        Close.Relative(0.966068118874185, outcome.Statistic, WTolerance);
        Close.Relative(0.43789859550621, outcome.P, PTolerance);
    }

    [Fact]
    public void Shapiro_wilk_matches_r_at_the_largest_valid_size_5000()
    {
        // R 4.2.2: i <- 1:5000; x <- ((i*7919) %% 10007)/10007 + ((i*104729) %% 10009)/10009
        //   + ((i*1299709) %% 10037)/10037; shapiro.test(x) -> W 0.99762320413223893, p 5.1186569957500896e-07
        var outcome = ShapiroWilk.Test(ReferenceSamples.ScrambledSum(5000));

        Close.Relative(0.99762320413223893, outcome.Statistic, WTolerance);
        Close.Relative(5.1186569957500896e-07, outcome.P, PTolerance);
    }

    [Fact]
    public void Shapiro_wilk_keeps_precision_under_an_offset_of_a_billion()
    {
        // Multiples of 1/64 stay exact after adding 1e9, and W is location invariant, so the check value is R on
        // the un-offset sample. R 4.2.2: y <- c(37, 12, 55, 21, 48, 30, 9, 64, 26, 41, 18, 33, 50, 27, 70)/64;
        // shapiro.test(y) -> W 0.96839217554941581, p 0.83356979307704493
        // (R itself gives W 0.96839217926786847 for y + 1e9, off by 4e-9).
        double[] y = [37, 12, 55, 21, 48, 30, 9, 64, 26, 41, 18, 33, 50, 27, 70];
        var offset = y.Select(v => 1e9 + (v / 64)).ToArray();

        var outcome = ShapiroWilk.Test(offset);

        Close.Relative(0.96839217554941581, outcome.Statistic, WTolerance);
        Close.Relative(0.83356979307704493, outcome.P, PTolerance);
    }

    [Fact]
    public void Shapiro_wilk_above_5000_keeps_w_and_reports_too_many_values()
    {
        // scipy 1.10: i = np.arange(1, 5002, dtype=np.int64); x = ((i*7919)%10007)/10007 + ((i*104729)%10009)/10009
        //   + ((i*1299709)%10037)/10037; stats.shapiro(x).statistic -> 0.9976249933242798. scipy's routine works in
        // single precision (at n = 5000 it differs from R's double-precision W by 2e-6), hence 1e-5.
        var outcome = ShapiroWilk.Test(ReferenceSamples.ScrambledSum(5001));

        Assert.False(outcome.IsTestable);
        Assert.Equal(NotTestableReason.TooManyValues, outcome.Reason);
        Assert.True(double.IsNaN(outcome.P));
        Close.Relative(0.9976249933242798, outcome.Statistic, 1e-5);
    }

    [Theory]
    [InlineData(5001)]
    [InlineData(20_000)]
    [InlineData(300_001)]
    public void Above_the_cache_limit_the_unstored_weights_give_the_numerator_of_the_stored_ones(int n)
    {
        // the same weights, the common factor 1/√φ applied once instead of to each, the sum compensated: equal up to the
        // rounding of the stored weights' plain sum of n/2 products of one sign, at most about (n/2)·ε relative
        // (Higham 2002, Accuracy and Stability of Numerical Algorithms, §4.2)
        var random = new Random(n);
        var x = Enumerable.Range(0, n).Select(_ => random.NextDouble() - random.NextDouble()).Order().ToArray();
        var range = x[^1] - x[0];
        var stored = ShapiroWilk.Numerator(ShapiroWilkCoefficients.Compute(n), x, range);
        Assert.Equal(stored, ShapiroWilkCoefficients.Numerator(x, range), Math.Abs(stored) * (n / 2) * 2.220446049250313e-16);
    }

    [Fact]
    public void Shapiro_wilk_needs_three_values()
    {
        var outcome = ShapiroWilk.Test([1.0, 2.0]);

        Assert.Equal(NotTestableReason.TooFewValues, outcome.Reason);
        Assert.True(double.IsNaN(outcome.Statistic));
    }

    [Fact]
    public void Shapiro_wilk_on_identical_values_is_zero_spread()
    {
        Assert.Equal(NotTestableReason.ZeroSpread, ShapiroWilk.Test([4.2, 4.2, 4.2, 4.2]).Reason);
        Assert.Equal(NotTestableReason.ZeroSpread, ShapiroWilk.Test([0.0, 0.0, 0.0]).Reason);
    }

    [Fact]
    public void Shapiro_wilk_does_not_reorder_its_input_and_agrees_with_the_sorted_entry()
    {
        double[] sample = [3.1, 4.7, 2.2, 9.8, 5.0];
        var before = sample.ToArray();
        var unsorted = ShapiroWilk.Test(sample);
        Array.Sort(before);

        Assert.Equal([3.1, 4.7, 2.2, 9.8, 5.0], sample);
        Assert.Equal(unsorted, ShapiroWilk.TestSorted(before));
    }

    [Fact]
    public void Shapiro_wilk_sorted_entry_rejects_unsorted_values()
    {
        Assert.Throws<ArgumentException>(() => ShapiroWilk.TestSorted([1.0, 3.0, 2.0]));
    }

    [Fact]
    public void Shapiro_wilk_rejects_non_finite_values()
    {
        Assert.Throws<ArgumentException>(() => ShapiroWilk.Test([1.0, double.NaN, 2.0]));
    }

    [Theory]
    // AS R94 Fortran values as quoted in HypothesisTests.jl tests, printed to six significant digits: a relative
    // 5e-6 is never less than half a unit in the sixth significant digit
    [InlineData(10, new[] { 0.573715, 0.32897, 0.214349, 0.122791, 0.0400887 })]
    [InlineData(20, new[] { 0.473371, 0.32174, 0.255663, 0.208297, 0.16864, 0.133584, 0.101474, 0.0712893, 0.0423232, 0.0140351 })]
    public void Shapiro_wilk_coefficients_match_the_published_as_r94_values(int n, double[] expected)
    {
        var a = ShapiroWilk.Coefficients(n);

        Assert.Equal(expected.Length, a.Length);
        for (var i = 0; i < a.Length; i++)
        {
            Close.Relative(expected[i], a[i], 5e-6);
        }
    }

    [Theory]
    [InlineData(3)]
    [InlineData(4)]
    [InlineData(11)]
    [InlineData(5000)]
    public void Shapiro_wilk_coefficients_have_unit_length(int n)
    {
        // Royston's construction scales the inner weights so that Σ aᵢ² = 1 (both halves); rounding only
        var sum = 2.0 * ShapiroWilk.Coefficients(n).Sum(v => v * v);

        Close.Absolute(1.0, sum, 1e-14);
    }

    [Fact]
    public void Shapiro_wilk_coefficient_cache_gives_the_same_vectors_under_parallel_use()
    {
        // the cache is lock-free: racing threads may compute a vector twice, but every caller must see equal values
        var mismatches = 0;
        Parallel.For(0, 2000, i =>
        {
            var n = 3 + (i % 200);
            if (!ShapiroWilk.Coefficients(n).SequenceEqual(ShapiroWilkCoefficients.Compute(n)))
            {
                Interlocked.Increment(ref mismatches);
            }
        });

        Assert.Equal(0, mismatches);
    }

    [Fact]
    public void Shapiro_wilk_exact_n3_p_value_is_one_at_w_one_and_zero_at_three_quarters()
    {
        // Shapiro & Wilk (1965): for n = 3, W ranges over [3/4, 1] with p = (6/π)(asin √W − π/3)
        Assert.Equal(1.0, ShapiroWilk.PValue(1.0, 3), 14);
        Assert.Equal(0.0, ShapiroWilk.PValue(0.75, 3), 14);
    }
}
