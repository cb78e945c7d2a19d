using MathNet.Numerics;

namespace CellCheck.Core.Tests.Scale;

/// <summary>
/// Upper-tail probabilities from MathNet's special functions by the textbook identities, so that small p keep their
/// relative precision (1 − CDF would not).
/// </summary>
internal static class ReferenceTails
{
    /// <summary>P(F ≥ f) = I_x(d2/2, d1/2) at x = d2 / (d2 + d1 f) (Abramowitz &amp; Stegun 1964, 26.6.2).</summary>
    public static double F(double f, double d1, double d2) => SpecialFunctions.BetaRegularized(d2 / 2, d1 / 2, d2 / (d2 + (d1 * f)));

    /// <summary>P(X ≥ x) = Q(df/2, x/2) for chi-square with df degrees of freedom (Abramowitz &amp; Stegun 1964, 26.4.19).</summary>
    public static double ChiSquare(double x, double df) => SpecialFunctions.GammaUpperRegularized(df / 2, x / 2);

    /// <summary>P(Z ≥ z) = erfc(z / √2) / 2 for a standard normal Z.</summary>
    public static double Normal(double z) => 0.5 * SpecialFunctions.Erfc(z / Math.Sqrt(2.0));
}
