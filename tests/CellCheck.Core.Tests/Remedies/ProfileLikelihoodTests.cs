using CellCheck.Core.Remedies;
using CellCheck.Core.Tests.Statistics;

namespace CellCheck.Core.Tests.Remedies;

/// <summary>The bounded maximiser and the likelihood-ratio interval on functions with known answers.</summary>
public sealed class ProfileLikelihoodTests
{
    /// <summary>χ²₁(0.95) = 3.841458820694124 (R: qchisq(0.95, 1)); the interval of −(λ − c)² is c ± √(χ²/2).</summary>
    private static readonly double HalfWidth = Math.Sqrt(3.841458820694124 / 2);

    [Fact]
    public void A_quadratic_has_its_vertex_and_the_chi_square_interval()
    {
        var (lambda, max, lower, upper) = ProfileLikelihood.Maximise(l => 7 - ((l - 0.3) * (l - 0.3)), -5, 5);
        // a smooth maximum is placed to about sqrt(machine epsilon): 1e-7; the ends are roots found to 1e-12
        Close.Absolute(0.3, lambda, 1e-7);
        Close.Absolute(7, max, 1e-12);
        Close.Absolute(0.3 - HalfWidth, lower!.Value, 1e-9);
        Close.Absolute(0.3 + HalfWidth, upper!.Value, 1e-9);
    }

    [Fact]
    public void The_global_maximum_is_found_among_two_local_ones_and_an_open_end_is_reported()
    {
        // two bumps: a low one at -3 and a high one at 4; the interval around 4 runs past the upper bound of 5
        static double F(double l) => Math.Max(1 - ((l + 3) * (l + 3)), 3 - (0.1 * (l - 4) * (l - 4)));
        var (lambda, _, lower, upper) = ProfileLikelihood.Maximise(F, -5, 5);
        Close.Absolute(4, lambda, 1e-6);
        Assert.Null(upper);
        // 3 - 0.1 (l - 4)^2 = 3 - 1.920729... -> l = 4 - sqrt(19.20729...)
        Close.Absolute(4 - Math.Sqrt(10 * 3.841458820694124 / 2), lower!.Value, 1e-9);
    }

    [Fact]
    public void A_likelihood_rising_to_the_bound_gives_the_bound()
    {
        var (lambda, _, lower, upper) = ProfileLikelihood.Maximise(l => l, -5, 5);
        Assert.Equal(5, lambda);
        Assert.Null(upper);
        Close.Absolute(5 - (3.841458820694124 / 2), lower!.Value, 1e-9);
    }

    [Fact]
    public void The_search_evaluates_each_point_once_and_finds_what_it_finds_without_remembering()
    {
        static double Profile(double l) => 7 - ((l - 0.3) * (l - 0.3)) + (0.01 * Math.Sin(9 * l));
        var calls = new List<double>();
        var remembered = ProfileLikelihood.Maximise(l => { calls.Add(l); return Profile(l); }, -5, 5, ProfileLikelihood.CoarseStep);
        Assert.Equal(calls.Count, calls.Distinct().Count());

        // the same search with a function that has no memory of its own gives the same doubles
        var profile = new RememberedProfile(Profile);
        Assert.Equal(Profile(0.7), profile.At(0.7));
        Assert.Equal(Profile(0.7), profile.At(0.7));
        Assert.Equal(1, profile.Evaluations);
        Assert.Equal(remembered, ProfileLikelihood.Maximise(Profile, -5, 5, ProfileLikelihood.CoarseStep));
    }
}

