using CellCheck.Core.Remedies;
using CellCheck.Core.Tests.Models;
using CellCheck.Core.Tests.Statistics;

namespace CellCheck.Core.Tests.Remedies;

/// <summary>
/// Box-Cox profile likelihood against MASS::boxcox (R 4.2.2, MASS 7.3-58.2; Fixtures/remedy-check-values.R) and the
/// scipy boxcox_llf guard cases (values from mpmath, in scipy's test_morestats.py, as listed in the shared reference set).
/// MASS divides y by its geometric mean, so its log-likelihood is ours − (n/2)·log n + Σ log y.
/// </summary>
public sealed class BoxCoxTests
{
    private static double MassScale(double logLikelihood, double[] y) =>
        logLikelihood - (y.Length / 2.0 * Math.Log(y.Length)) + y.Sum(Math.Log);

    [Fact]
    public void The_poisons_additive_model_gives_the_published_lambda_and_interval()
    {
        var poisons = PoisonsDesign.Load();
        var fit = BoxCox.Fit(poisons.Design(), poisons.Time, "poison + treat");
        // shared reference: lambda-hat -0.750162520648086 (MASS::boxcox with optimize; car::powerTransform -0.750162);
        // Box & Cox (1964) report about -0.75. Tolerance 1e-6: the log-likelihood is flat at its maximum, so any
        // optimiser places the maximum only to about sqrt(machine epsilon) (R's own tol = 1e-12 run gives -0.750162548).
        Close.Absolute(-0.750162520648086, fit.Lambda, 1e-6);
        // shared reference: max log-likelihood on the MASS scale -13.8887843112629; at the maximum an error of 1e-6 in
        // lambda changes the value by about 1e-11, so 1e-10 relative.
        Close.Relative(-13.8887843112629, MassScale(fit.LogLikelihood, poisons.Time), 1e-10);
        // shared reference: 95% profile interval (-1.13803, -0.35609), printed to 5 decimals; full precision from
        // Fixtures/remedy-check-values.R (uniroot, tol 1e-14): -1.1380345390556192, -0.35608713935717728. The ends
        // are roots of a steep function (slope about 5 per unit lambda), found to 1e-12; 1e-8 allows for R's flat maximum.
        Close.Absolute(-1.1380345390556192, fit.CiLower!.Value, 1e-8);
        Close.Absolute(-0.35608713935717728, fit.CiUpper!.Value, 1e-8);
        Assert.Equal(42, fit.ResidualDf);
        Assert.Equal("poison + treat", fit.Model);
    }

    [Fact]
    public void The_full_factorial_model_gives_a_different_lambda_than_the_additive_one()
    {
        var poisons = PoisonsDesign.Load();
        var cells = poisons.Poison.Zip(poisons.Treat, (p, t) => p + t).ToArray();
        var levels = cells.Distinct().Order(StringComparer.Ordinal).ToArray();
        var x = new double[cells.Length, levels.Length];
        for (var i = 0; i < cells.Length; i++)
        {
            x[i, Array.IndexOf(levels, cells[i])] = 1;
        }

        var fit = BoxCox.Fit(x, poisons.Time, "cell-means");
        // R: MASS::boxcox(lm(time ~ poison * treat)) with optimize / uniroot (Fixtures/remedy-check-values.R):
        // lambda -0.81573613560890923, loglik -10.394673517838601, interval -1.2941396129539233 to -0.34116316522723777;
        // tolerances as for the additive model
        Close.Absolute(-0.81573613560890923, fit.Lambda, 1e-6);
        Close.Relative(-10.394673517838601, MassScale(fit.LogLikelihood, poisons.Time), 1e-10);
        Close.Absolute(-1.2941396129539233, fit.CiLower!.Value, 1e-8);
        Close.Absolute(-0.34116316522723777, fit.CiUpper!.Value, 1e-8);
    }

    [Theory]
    // R: boxcox(lm(time ~ poison + treat), lambda = c(0, 1, -1, 0.5))$y (Fixtures/remedy-check-values.R). MASS uses a
    // series in |lambda| <= 1/50 (exact at 0) and (y^l - 1)/l elsewhere; closed form, 1e-12 relative.
    [InlineData(0.0, -20.42681596093378)]
    [InlineData(1.0, -42.269229943970252)]
    [InlineData(-1.0, -14.691324130077351)]
    [InlineData(0.5, -30.141960731188281)]
    public void The_log_likelihood_matches_mass_at_the_usual_powers(double lambda, double expected)
    {
        var poisons = PoisonsDesign.Load();
        Close.Relative(expected, MassScale(BoxCox.LogLikelihood(poisons.Design(), poisons.Time, lambda), poisons.Time), 1e-12);
    }

    [Fact]
    public void A_large_negative_power_does_not_overflow_or_lose_the_spread()
    {
        // scipy test_morestats.py (boxcox_llf overflow case), value from mpmath: data 198 233 233 392 at lambda = -8
        // -> -17.93934208579061; 1e-12 relative: the log-space evaluation has no cancellation here
        Close.Relative(-17.93934208579061, BoxCox.LogLikelihood([198, 233, 233, 392], -8), 1e-12);
    }

    [Fact]
    public void A_power_near_zero_does_not_cancel()
    {
        // scipy test_morestats.py (boxcox_llf near lambda = 0), value from mpmath: data 2003 1950 1997 2000 2009 at
        // lambda = 1e-8 -> -15.32401272869016598 (scipy 1.10.1 itself gives -15.324012990711395, wrong in the 8th
        // digit); 1e-12 relative: expm1 keeps full precision
        Close.Relative(-15.32401272869016598, BoxCox.LogLikelihood([2003, 1950, 1997, 2000, 2009], 1e-8), 1e-12);
    }

    [Fact]
    public void The_log_likelihood_is_continuous_through_zero()
    {
        double[] y = [2003, 1950, 1997, 2000, 2009];
        var atZero = BoxCox.LogLikelihood(y, 0);
        // the derivative in lambda is of order sum(log y) ~ 38: a step of 1e-12 moves the value by ~4e-11
        Close.Absolute(atZero, BoxCox.LogLikelihood(y, 1e-12), 1e-10);
        Close.Absolute(atZero, BoxCox.LogLikelihood(y, -1e-12), 1e-10);
    }

    [Fact]
    public void The_transform_near_zero_follows_its_series()
    {
        // (y^l - 1)/l = log y + l (log y)^2 / 2 + O(l^2): at l = 1e-9 the series to first order is exact in double
        var log = Math.Log(2000.0);
        Close.Relative(log + (1e-9 * log * log / 2), BoxCox.Transform(2000, 1e-9), 1e-15);
        Assert.Equal(Math.Log(7.5), BoxCox.Transform(7.5, 0));
        // (5^-1 - 1)/(-1) = 0.8
        Close.Relative(0.8, BoxCox.Transform(5, -1), 1e-15);
    }

    [Fact]
    public void Non_positive_values_are_a_programming_error()
    {
        Assert.Throws<ArgumentException>(() => BoxCox.LogLikelihood([1, 0, 2], 0.5));
        Assert.Throws<ArgumentOutOfRangeException>(() => BoxCox.Transform(-1, 0.5));
    }
}
