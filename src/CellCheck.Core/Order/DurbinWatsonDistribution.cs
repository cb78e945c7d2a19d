using CellCheck.Core.Statistics;

namespace CellCheck.Core.Order;

/// <summary>
/// The null distribution of the Durbin-Watson statistic for one design, under independent normal errors of equal
/// variance. With e = Mε the statistic is d = εᵀMAMε / εᵀMε, a ratio of quadratic forms; if λ_1..λ_m (m = n − p)
/// are the eigenvalues of M A M on the range of M, then P(d ≤ d₀) = P(Σ (λ_i − d₀) z_i² ≤ 0) for independent standard
/// normal z_i (Durbin &amp; Watson 1950, "Testing for serial correlation in least squares regression I", Biometrika 37,
/// 409-428, §3-4).
/// </summary>
/// <remarks>
/// Moments. d is independent of εᵀMε (it depends on ε only through its direction), so E[εᵀMAMε] = E[d]·E[εᵀMε] and
/// E[(εᵀMAMε)²] = E[d²]·E[(εᵀMε)²]. With E[εᵀMε] = m, E[(εᵀMε)²] = m(m + 2), E[εᵀBε] = tr B and
/// E[(εᵀBε)²] = 2 tr B² + (tr B)² for B = MAM this gives E[d] = tr(MA)/m and
/// Var[d] = 2[m tr((MA)²) − tr(MA)²] / (m²(m + 2)): Durbin &amp; Watson's (1950) mean P/(n − k) and variance
/// 2(Q − P·E[d]) / ((n − k)(n − k + 2)) with P = tr(MA), Q = tr((MA)²) (see also Durbin &amp; Watson 1971, "Testing
/// for serial correlation in least squares regression III", Biometrika 58, 1-19). E[d] is 2 for an intercept
/// alone but not in general: 1.864 for the 16-run 2⁴ factorial with four main effects in the tests, 2.015 for 400
/// runs in four blocks of consecutive runs.
/// </remarks>
internal sealed class DurbinWatsonDistribution
{
    private readonly ProjectedDifference design;
    private double[]? eigenvalues;

    internal DurbinWatsonDistribution(ProjectedDifference design)
    {
        this.design = design;
        DegreesOfFreedom = design.N - design.Columns;
        double m = DegreesOfFreedom;
        Mean = design.TraceMA / m;
        Variance = Math.Max(0.0, 2.0 * ((m * design.TraceMASquared) - (design.TraceMA * design.TraceMA)) / (m * m * (m + 2)));
    }

    /// <summary>m = n − p, the number of nonzero-weight terms.</summary>
    internal int DegreesOfFreedom { get; }

    /// <summary>E[d] = tr(MA) / (n − p).</summary>
    internal double Mean { get; }

    /// <summary>Var[d] = 2[(n − p) tr((MA)²) − tr(MA)²] / ((n − p)²(n − p + 2)).</summary>
    internal double Variance { get; }

    /// <summary>The n − p eigenvalues of M A M on the range of M, ascending. Computed once, in O(n³) time: the
    /// lower triangle of M A M is reduced to tridiagonal form and its eigenvalues found by bisection; the p smallest
    /// of the n eigenvalues are the zeros belonging to the columns of X (every eigenvalue is ≥ 0, A being DᵀD) and are
    /// dropped.</summary>
    internal double[] Eigenvalues()
    {
        if (eigenvalues is null)
        {
            var (diagonal, offDiagonal) = HouseholderTridiagonal.Reduce(design.LowerTriangle());
            var all = TridiagonalEigenvalues.Ascending(diagonal, offDiagonal);
            eigenvalues = all[design.Columns..];
        }

        return eigenvalues;
    }

    /// <summary>P(d ≤ <paramref name="d"/>) by Imhof's integral over the eigenvalues, with its absolute error bound.</summary>
    internal (double Probability, double ErrorBound) ExactCdf(double d)
    {
        var lambda = Eigenvalues();
        var weights = new double[lambda.Length];
        for (var i = 0; i < lambda.Length; i++)
        {
            weights[i] = lambda[i] - d;
        }

        return QuadraticFormCdf.LowerTailAtZero(weights);
    }

    /// <summary>P(d ≤ <paramref name="d"/>) from the normal distribution with the exact mean and variance.</summary>
    internal double NormalCdf(double d) => StandardNormal.Cdf((d - Mean) / Math.Sqrt(Variance));

    /// <summary>P(d ≥ <paramref name="d"/>) from the same normal distribution, without cancellation.</summary>
    internal double NormalUpperTail(double d) => StandardNormal.UpperTail((d - Mean) / Math.Sqrt(Variance));
}
