namespace CellCheck.Core.Remedies;

/// <summary>
/// The Yeo-Johnson power transformation and its profile likelihood (Yeo &amp; Johnson 2000, "A new family of power
/// transformations to improve normality or symmetry", Biometrika 87, 954-959): for y ≥ 0, ((y + 1)^λ − 1)/λ (log(y + 1)
/// at λ = 0); for y &lt; 0, −((1 − y)^(2−λ) − 1)/(2 − λ) (−log(1 − y) at λ = 2). It is defined for values of any sign and
/// is the identity at λ = 1. For a linear model with normal errors on the transformed scale the profile
/// log-likelihood is ℓ(λ) = −(n/2)·log(RSS(λ)/n) + (λ − 1)·Σ sign(yᵢ)·log(1 + |yᵢ|) (the log Jacobian), without the
/// constant −(n/2)(1 + log 2π): the quantity scipy.stats.yeojohnson_llf computes for a single sample.
/// </summary>
/// <remarks>
/// Overflow guard: with aᵢ the exponent of row i (λ·log(1 + y) or (2 − λ)·log(1 − y)) and M = max(0, max aᵢ), the
/// transformed values are computed as e^M times (e^{aᵢ−M} − e^{−M})/d, d the branch's divisor (as e^{−M}·expm1(aᵢ)/d
/// when |aᵢ| ≤ 1), and log RSS = 2M + log RSS(scaled); when M ≤ 1 they are computed directly with expm1, which keeps
/// full precision near λ = 0 and λ = 2. log(1 + |y|) uses Goldberg's correction (Higham 2002, Accuracy and Stability
/// of Numerical Algorithms, §1.14.1). Unlike Box-Cox, the two branches carry different constants, so for large |λ| the spread among
/// values on one branch can be lost against its constant: the search range is kept to ±5.
/// </remarks>
public static class YeoJohnson
{
    /// <summary>Default search range for λ̂.</summary>
    public const double SearchLower = -5, SearchUpper = 5;

    /// <summary>The transformed value of <paramref name="y"/>.</summary>
    public static double Transform(double y, double lambda)
    {
        if (!double.IsFinite(y))
        {
            throw new ArgumentOutOfRangeException(nameof(y), y, "the value must be finite");
        }

        var (a, d, sign, log) = Branch(y, lambda);
        return sign * (d == 0 ? log : PreciseMath.ExpM1(a) / d);
    }

    /// <summary>The profile log-likelihood of a single sample (a model with an intercept only).</summary>
    public static double LogLikelihood(ReadOnlySpan<double> y, double lambda) =>
        LogLikelihood(new GroupedRss([0, y.Length]), Finite(y), lambda);

    /// <summary>λ̂ and its 95% interval for y on the model with design <paramref name="x"/> (which holds an intercept).</summary>
    public static PowerFit Fit(double[,] x, double[] y, string model, double shift = 0)
    {
        ArgumentNullException.ThrowIfNull(x);
        ArgumentNullException.ThrowIfNull(y);
        if (x.GetLength(0) != y.Length)
        {
            throw new ArgumentException($"X has {x.GetLength(0)} rows but y has {y.Length} values", nameof(y));
        }

        return Fit(new ProjectedRss(x), y, model, shift);
    }

    /// <summary>λ̂ and its 95% interval for a single sample.</summary>
    public static PowerFit Fit(double[] y, string model = "intercept only") =>
        Fit(new GroupedRss([0, (y ?? throw new ArgumentNullException(nameof(y))).Length]), y, model, 0);

    internal static PowerFit Fit(IResidualSumOfSquares rss, double[] y, string model, double shift)
    {
        ArgumentNullException.ThrowIfNull(model);
        if (rss.ResidualDf < 1)
        {
            throw new ArgumentException("the model leaves no residual degrees of freedom", nameof(rss));
        }

        var values = Finite(y);
        var (lambda, max, lower, upper) = ProfileLikelihood.Maximise(l => LogLikelihood(rss, values, l), SearchLower, SearchUpper);
        return new PowerFit(PowerFamily.YeoJohnson, model, y.Length, rss.ResidualDf, lambda, max, lower, upper, SearchLower, SearchUpper, shift);
    }

    internal static double LogLikelihood(IResidualSumOfSquares rss, double[] y, double lambda)
    {
        var n = y.Length;
        var jacobian = 0.0;
        var top = 0.0;
        for (var i = 0; i < n; i++)
        {
            var (a, _, sign, log) = Branch(y[i], lambda);
            jacobian += sign * log;
            top = Math.Max(top, a);
        }

        var scale = top <= 1 ? 0 : top;
        var t = new double[n];
        for (var i = 0; i < n; i++)
        {
            var (a, d, sign, log) = Branch(y[i], lambda);
            var value = d == 0 ? log * Math.Exp(-scale)
                : scale == 0 ? PreciseMath.ExpM1(a) / d
                : Math.Abs(a) <= 1 ? Math.Exp(-scale) * PreciseMath.ExpM1(a) / d
                : (Math.Exp(a - scale) - Math.Exp(-scale)) / d;
            t[i] = sign * value;
        }

        var logRss = (2 * scale) + Math.Log(rss.Of(t));
        return ((lambda - 1) * jacobian) - (n / 2.0 * (logRss - Math.Log(n)));
    }

    /// <summary>Exponent a, divisor d (0 for the log case), sign and log(1 + |y|) of y's branch.</summary>
    private static (double A, double D, double Sign, double Log) Branch(double y, double lambda)
    {
        if (y >= 0)
        {
            var log = PreciseMath.Log1P(y);
            return (lambda * log, lambda, 1, log);
        }

        var m = PreciseMath.Log1P(-y);
        return ((2 - lambda) * m, 2 - lambda, -1, m);
    }

    private static double[] Finite(ReadOnlySpan<double> y)
    {
        foreach (var v in y)
        {
            if (!double.IsFinite(v))
            {
                throw new ArgumentException("Yeo-Johnson needs finite values", nameof(y));
            }
        }

        return y.ToArray();
    }
}
