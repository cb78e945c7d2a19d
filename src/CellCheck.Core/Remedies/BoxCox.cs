namespace CellCheck.Core.Remedies;

/// <summary>
/// The Box-Cox power transformation and its profile likelihood (Box &amp; Cox 1964, "An analysis of
/// transformations", J. R. Stat. Soc. B 26, 211-252): y^(λ) = (y^λ − 1)/λ, log y at λ = 0, for y &gt; 0; for a linear
/// model with normal errors on the transformed scale, the log-likelihood maximised over the coefficients and σ² is
/// ℓ(λ) = −(n/2)·log(RSS(λ)/n) + (λ − 1)·Σ log yᵢ (their eq. 9, without the constant −(n/2)(1 + log 2π)), where
/// RSS(λ) is the residual sum of squares of y^(λ) on the model and the second term is the log Jacobian.
/// </summary>
/// <remarks>
/// <para>Evaluated in log space, which guards both ends of the λ range. With ℓᵢ = log yᵢ and r the row where λℓᵢ is
/// largest, y^(λ) = e^{λℓ_r}·wᵢ + constant with wᵢ = expm1(λ(ℓᵢ − ℓ_r))/λ; the constant is absorbed by the model's
/// intercept, so log RSS(λ) = 2λℓ_r + log RSS(w). Every exponent is ≤ 0, so nothing overflows for large |λ| and
/// the spread among values near the top is not lost against the constant; and expm1 keeps full precision
/// near λ = 0, where (y^λ − 1)/λ computed directly cancels (the case scipy's boxcox_llf once got wrong).</para>
/// <para>For the cell-means model the profile is evaluated from per-cell power sums (<see cref="GroupedPowerSums"/>),
/// which gives the same ℓ(λ) to rounding at a cost independent of the number of rows.</para>
/// <para>The model must contain an intercept (every model CellCheck builds does).</para>
/// </remarks>
public static class BoxCox
{
    /// <summary>Above this many groups the profile is first scanned on the coarse grid (<see cref="ProfileLikelihood.CoarseStep"/>).</summary>
    public const int CoarseGroups = 20000;

    /// <summary>Most groups whose power-sum profile is evaluated two λ at a time (each evaluation then takes at most 40 MB
    /// of scratch of its own).</summary>
    public const int SideBySideGroups = 1 << 20;

    /// <summary>Default search range for λ̂.</summary>
    public const double SearchLower = -5, SearchUpper = 5;

    /// <summary>(y^λ − 1)/λ, or log y at λ = 0, computed as expm1(λ·log y)/λ.</summary>
    /// <exception cref="ArgumentOutOfRangeException">y is not positive.</exception>
    public static double Transform(double y, double lambda)
    {
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(y);
        var log = Math.Log(y);
        return lambda == 0 ? log : PreciseMath.ExpM1(lambda * log) / lambda;
    }

    /// <summary>The profile log-likelihood of a single sample (a model with an intercept only), as defined in the
    /// class summary: the same quantity as scipy.stats.boxcox_llf.</summary>
    public static double LogLikelihood(ReadOnlySpan<double> y, double lambda) =>
        LogLikelihood(new GroupedRss([0, y.Length]), Logs(y), lambda);

    /// <summary>The profile log-likelihood of y on the model with design <paramref name="x"/> (which holds an intercept).</summary>
    public static double LogLikelihood(double[,] x, ReadOnlySpan<double> y, double lambda) =>
        LogLikelihood(new ProjectedRss(x), Logs(y), lambda);

    /// <summary>λ̂ and its 95% interval for y on the model with design <paramref name="x"/> (which holds an intercept).</summary>
    /// <exception cref="ArgumentException">A value is not positive and finite, sizes disagree, or no residual df remain.</exception>
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

    internal static PowerFit Fit(IResidualSumOfSquares rss, double[] y, string model, double shift) =>
        Fit(rss, y.Length, () => rss switch
        {
            GroupedRss grouped => new GroupedPowerSums(grouped.Starts, new PlainLogs(y)).LogLikelihood,
            SettingRss settings => new GroupedPowerSums(settings.Starts, new SettingLogs<ShiftedValues>(new ShiftedValues(y, 0), settings.Order), settings.Between).LogLikelihood,
            _ => ProfileOf(rss, Logs(y)),
        }, model, shift);

    /// <summary>The fit on cells plus blocks with y read on demand (the same fit as for its copy).</summary>
    internal static PowerFit Fit(SettingRss settings, ShiftedValues y, string model, double shift) =>
        Fit(settings, y.Length, () => new GroupedPowerSums(settings.Starts, new SettingLogs<ShiftedValues>(y, settings.Order), settings.Between).LogLikelihood, model, shift);

    private static PowerFit Fit(IResidualSumOfSquares rss, int n, Func<Func<double, double>> profileOf, string model, double shift)
    {
        ArgumentNullException.ThrowIfNull(model);
        if (rss.ResidualDf < 1)
        {
            throw new ArgumentException("the model leaves no residual degrees of freedom", nameof(rss));
        }

        var profile = profileOf();
        var groups = rss switch { GroupedRss g => g.Starts.Length, SettingRss s => s.Starts.Length, _ => n };
        var step = groups > CoarseGroups ? ProfileLikelihood.CoarseStep : ProfileLikelihood.GridStep;
        // the power-sum profiles (grouped and blocked models) may be evaluated side by side; a costly one is, unless the
        // second evaluation's scratch (five doubles a group) would be large
        var sideBySide = step == ProfileLikelihood.CoarseStep && groups <= SideBySideGroups && rss is GroupedRss or SettingRss;
        var (lambda, max, lower, upper) = ProfileLikelihood.Maximise(profile, SearchLower, SearchUpper, step, sideBySide);
        return new PowerFit(PowerFamily.BoxCox, model, n, rss.ResidualDf, lambda, max, lower, upper, SearchLower, SearchUpper, shift);
    }

    internal static double LogLikelihood(IResidualSumOfSquares rss, double[] logs, double lambda)
    {
        var n = logs.Length;
        var sumLog = 0.0;
        foreach (var l in logs)
        {
            sumLog += l;
        }

        double logRss;
        if (lambda == 0)
        {
            logRss = Math.Log(rss.Of(logs));
        }
        else
        {
            var top = lambda > 0 ? logs.Max() : logs.Min();
            var w = new double[n];
            for (var i = 0; i < n; i++)
            {
                w[i] = PreciseMath.ExpM1(lambda * (logs[i] - top)) / lambda;
            }

            logRss = (2 * lambda * top) + Math.Log(rss.Of(w));
        }

        return ((lambda - 1) * sumLog) - (n / 2.0 * (logRss - Math.Log(n)));
    }

    private static Func<double, double> ProfileOf(IResidualSumOfSquares rss, double[] logs) => l => LogLikelihood(rss, logs, l);

    /// <summary>log y.</summary>
    private static double[] Logs(ReadOnlySpan<double> y)
    {
        var logs = new double[y.Length];
        for (var i = 0; i < y.Length; i++)
        {
            if (!PlainLogs.Usable(y[i]))
            {
                throw PlainLogs.Refusal(i, y[i]);
            }

            logs[i] = Math.Log(y[i]);
        }

        return logs;
    }
}
