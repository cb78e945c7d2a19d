namespace CellCheck.Core.Statistics;

/// <summary>
/// The D'Agostino-Pearson omnibus K² test of normality (D'Agostino &amp; Pearson 1973, Biometrika 60, 613-622), in
/// the form of D'Agostino, Belanger &amp; D'Agostino (1990, The American Statistician 44, 316-321):
/// K² = Z(√b1)² + Z(b2)², referred to chi-square with 2 degrees of freedom, P = exp(−K²/2). Valid for n ≥ 8.
/// </summary>
/// <remarks>
/// √b1 = m3/m2^(3/2) and b2 = m4/m2² are the moment estimators (see <see cref="Moments"/>). Z(√b1) is D'Agostino's
/// (1970, Biometrika 57, 679-681) Johnson S_U approximation to the null distribution of √b1; Z(b2) is the
/// Anscombe &amp; Glynn (1983, Biometrika 70, 227-234) approximation, which fits a shifted inverse chi-square to the
/// standardised b2 and normalises it by the Wilson-Hilferty cube root. Both z's are approximately standard normal
/// under normality, and the chi-square reference of K² is itself an approximation (the two z's are not independent).
/// D'Agostino, Belanger &amp; D'Agostino (1990) advise n ≥ 20 for the kurtosis z; from n = 8 to 19 it is computed
/// but is rougher.
/// </remarks>
public static class DagostinoPearson
{
    /// <summary>
    /// Tests a sample (any order, not modified). Not testable below n = 8 or when the values are equal up to
    /// rounding. When b2 lies at or below the lower end of the distribution fitted by Anscombe &amp; Glynn (see
    /// <see cref="KurtosisZ"/>), K² is +∞ and P = 0. Throws <see cref="ArgumentException"/> on NaN or infinity.
    /// </summary>
    public static TestOutcome Test(ReadOnlySpan<double> sample)
    {
        SampleGuard.RequireFinite(sample, nameof(sample));
        if (sample.Length < 8)
        {
            return TestOutcome.NotTestable(NotTestableReason.TooFewValues);
        }

        if (SampleGuard.HasNoSpread(sample))
        {
            return TestOutcome.NotTestable(NotTestableReason.ZeroSpread);
        }

        var scale = SampleGuard.ScaleFor(sample);
        var moments = scale == 1.0 ? CentralMoments.Of(sample) : CentralMoments.Of(SampleGuard.Scaled(sample, scale));
        var zs = SkewnessZFromMoments(moments);
        var zk = KurtosisZFromMoments(moments);
        var k2 = (zs * zs) + (zk * zk);
        return new TestOutcome(k2, Math.Exp(-0.5 * k2), Df1: 2);
    }

    /// <summary>
    /// D'Agostino's (1970) normal deviate for the sample skewness √b1: with
    /// Y = √b1 √((n + 1)(n + 3) / (6(n − 2))), β₂(√b1) = 3(n² + 27n − 70)(n + 1)(n + 3) / ((n − 2)(n + 5)(n + 7)(n + 9)),
    /// W² = √(2(β₂ − 1)) − 1, δ = 1/√(log W), α = √(2/(W² − 1)): Z = δ asinh(Y/α). NaN below n = 8 or without spread.
    /// </summary>
    public static double SkewnessZ(ReadOnlySpan<double> sample)
    {
        SampleGuard.RequireFinite(sample, nameof(sample));
        return sample.Length < 8 || SampleGuard.HasNoSpread(sample) ? double.NaN : SkewnessZFromMoments(CentralMoments.Of(sample));
    }

    /// <summary>
    /// Anscombe &amp; Glynn's (1983) normal deviate for the sample kurtosis b2: with E = 3(n − 1)/(n + 1),
    /// V = 24n(n − 2)(n − 3)/((n + 1)²(n + 3)(n + 5)), x = (b2 − E)/√V, √β₁(b2) = 6(n² − 5n + 2)/((n + 7)(n + 9)) ·
    /// √(6(n + 3)(n + 5)/(n(n − 2)(n − 3))) and A = 6 + (8/√β₁)(2/√β₁ + √(1 + 4/β₁)):
    /// Z = [1 − 2/(9A) − ((1 − 2/A)/(1 + x√(2/(A − 4))))^(1/3)] / √(2/(9A)).
    /// The fitted distribution requires 1 + x√(2/(A − 4)) &gt; 0. At or below zero b2 lies beyond the lower end of
    /// that distribution, where its left-tail probability is zero, so Z = −∞ (not the cube root of a negative
    /// number, which would turn a very flat sample into a large positive Z). NaN below n = 8 or without spread.
    /// </summary>
    public static double KurtosisZ(ReadOnlySpan<double> sample)
    {
        SampleGuard.RequireFinite(sample, nameof(sample));
        return sample.Length < 8 || SampleGuard.HasNoSpread(sample) ? double.NaN : KurtosisZFromMoments(CentralMoments.Of(sample));
    }

    private static double SkewnessZFromMoments(CentralMoments m)
    {
        double n = m.Count;
        var rootB1 = m.M3 / (m.M2 * Math.Sqrt(m.M2));
        var y = rootB1 * Math.Sqrt((n + 1.0) * (n + 3.0) / (6.0 * (n - 2.0)));
        var beta2 = 3.0 * ((n * n) + (27.0 * n) - 70.0) * (n + 1.0) * (n + 3.0)
            / ((n - 2.0) * (n + 5.0) * (n + 7.0) * (n + 9.0));
        var w2 = Math.Sqrt(2.0 * (beta2 - 1.0)) - 1.0;
        var delta = 1.0 / Math.Sqrt(0.5 * Math.Log(w2));
        var alpha = Math.Sqrt(2.0 / (w2 - 1.0));
        return delta * Math.Asinh(y / alpha);
    }

    private static double KurtosisZFromMoments(CentralMoments m)
    {
        double n = m.Count;
        var b2 = m.M4 / (m.M2 * m.M2);
        var expected = 3.0 * (n - 1.0) / (n + 1.0);
        var variance = 24.0 * n * (n - 2.0) * (n - 3.0) / ((n + 1.0) * (n + 1.0) * (n + 3.0) * (n + 5.0));
        var x = (b2 - expected) / Math.Sqrt(variance);
        var rootBeta1 = 6.0 * ((n * n) - (5.0 * n) + 2.0) / ((n + 7.0) * (n + 9.0))
            * Math.Sqrt(6.0 * (n + 3.0) * (n + 5.0) / (n * (n - 2.0) * (n - 3.0)));
        var a = 6.0 + (8.0 / rootBeta1 * ((2.0 / rootBeta1) + Math.Sqrt(1.0 + (4.0 / (rootBeta1 * rootBeta1)))));
        var denominator = 1.0 + (x * Math.Sqrt(2.0 / (a - 4.0)));
        if (denominator <= 0.0)
        {
            return double.NegativeInfinity;
        }

        var cubeRoot = Math.Cbrt((1.0 - (2.0 / a)) / denominator);
        return (1.0 - (2.0 / (9.0 * a)) - cubeRoot) / Math.Sqrt(2.0 / (9.0 * a));
    }
}
