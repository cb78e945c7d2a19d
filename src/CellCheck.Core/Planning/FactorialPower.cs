using CellCheck.Core.Models;

namespace CellCheck.Core.Planning;

/// <summary>
/// Power of the F test of one term of a balanced factorial ANOVA: P(F' &gt; F_{1−α}(ν1, ν2)) with F' noncentral F
/// (<see cref="NoncentralF"/>), ν1 the term's degrees of freedom, ν2 the design's residual degrees of freedom with n
/// replicates per cell, and λ = n·Σ_cells τ² / σ² for term effects τ (Scheffé 1959, The Analysis of Variance, Wiley;
/// Cohen 1988, Statistical Power Analysis for the Behavioral Sciences, ch. 8).
/// </summary>
/// <remarks>
/// A stated smallest difference Δ is placed in the least favourable configuration, the one with the smallest λ
/// (<see cref="DifferenceConfiguration"/>): for a main effect two level means Δ apart and every other level at the grand
/// mean, λ = n·(cells / levels)·Δ²/(2σ²); for an interaction of k factors a difference of differences Δ between two
/// levels of each of its factors and every other contrast of the term zero, which divides by 2^k instead of 2. A factor
/// declared numeric enters as a linear term: Δ is then the change across its range, and its factor ½ becomes
/// Σ(x − x̄)² / (x_max − x_min)² over its levels. Cohen's f is the SD of the effects over the cells in units of σ,
/// f² = (Σ_cells τ² / cells) / σ², so λ = f²·N with N = n·cells.
/// </remarks>
public static class FactorialPower
{
    public const string DifferenceConfiguration =
        "least favourable configuration: for a main effect, two level means differ by the stated difference and every other "
        + "level sits at the grand mean; for an interaction, one difference of differences (between two levels of each of its "
        + "factors) equals it and every other contrast of the term is zero; for a numeric factor, the mean changes linearly by "
        + "the stated difference across its range";

    public const string CohenFConfiguration =
        "Cohen's f: the standard deviation of the term's effects across all cells, in units of the within-cell SD; λ = f²·N";

    /// <summary>The noncentrality λ of <paramref name="term"/> with n replicates per cell.</summary>
    public static double Lambda(PlannedDesign design, ModelTerm term, double n, SmallestEffect effect, double sd)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(term);
        ArgumentNullException.ThrowIfNull(effect);
        if (effect.Scale == EffectScale.CohenF)
        {
            return effect.Value * effect.Value * design.Rows(n);
        }

        var others = (double)design.Cells;
        var spread = 1.0;
        foreach (var f in term.Factors)
        {
            var factor = design.Factors[f];
            others /= factor.Levels;
            spread *= SpreadFactor(factor);
        }

        return n * others * effect.Value * effect.Value * spread / (sd * sd);
    }

    /// <summary>The power of the term's F test at alpha with n replicates per cell (NaN when no residual df remain).</summary>
    public static TermPower Power(PlannedDesign design, ModelTerm term, double n, SmallestEffect effect, double sd, double alpha)
    {
        ArgumentNullException.ThrowIfNull(design);
        var df1 = design.TermDf(term);
        var df2 = design.ResidualDf(n);
        var lambda = Lambda(design, term, n, effect, sd);
        var power = df1 >= 1 && df2 > 0 && double.IsFinite(lambda) ? Power(df1, df2, lambda, alpha) : double.NaN;
        return new TermPower(n, df1, df2, lambda, power);
    }

    /// <summary>P(F' &gt; F_{1−α}(df1, df2)) for noncentrality λ.</summary>
    public static double Power(double df1, double df2, double lambda, double alpha) =>
        NoncentralF.UpperTail(FCritical.Upper(alpha, df1, df2), df1, df2, lambda);

    /// <summary>Σ τ² over the factor's levels for a unit difference: ½ for two levels apart, Σ(x − x̄)²/range² for a linear term.</summary>
    private static double SpreadFactor(PlannedFactor factor)
    {
        if (factor.LevelValues is not { } x)
        {
            return 0.5;
        }

        var mean = x.Average();
        var range = x.Max() - x.Min();
        return range > 0 ? x.Sum(v => (v - mean) * (v - mean)) / (range * range) : double.NaN;
    }
}
