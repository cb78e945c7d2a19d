namespace CellCheck.Core.Models;

/// <summary>
/// A least-squares fit y ≈ Xβ from <see cref="LinearFit.Fit"/>, with the case diagnostics of Belsley, Kuh &amp; Welsch
/// (1980, Regression Diagnostics) and Cook (1977, "Detection of influential observation in linear regression",
/// Technometrics 19, 15-18). Arrays indexed by column follow the columns of X; arrays indexed by row follow its rows.
/// </summary>
/// <param name="Coefficients">β̂ for each column of X; NaN for an aliased column.</param>
/// <param name="StandardErrors">σ̂ √[(XₑᵀXₑ)⁻¹]ⱼⱼ over the estimable columns Xₑ; NaN for an aliased column, and for
/// every column when <paramref name="ResidualDf"/> is 0.</param>
/// <param name="Aliased">Columns of X declared linearly dependent on the kept ones, ascending.</param>
/// <param name="EstimableColumns">Columns of X that were kept, ascending (the complement of
/// <paramref name="Aliased"/>); see <see cref="LinearFit.EstimableDesign"/>.</param>
/// <param name="Rank">The numerical rank r: the number of estimable columns.</param>
/// <param name="RankTolerance">The tolerance the rank was decided with (relative to |R₁₁| of the scaled X).</param>
/// <param name="ResidualDf">n − r.</param>
/// <param name="ResidualSumOfSquares">Σ eᵢ².</param>
/// <param name="ResidualSd">σ̂ = √(RSS / (n − r)); NaN when n − r = 0.</param>
/// <param name="Fitted">ŷᵢ (equal to yᵢ where the leverage is 1).</param>
/// <param name="Residuals">eᵢ = yᵢ − ŷᵢ (exactly 0 where the leverage is 1).</param>
/// <param name="Leverage">Hat values hᵢᵢ, the squared row norms of the thin Q of the estimable columns; exactly 1
/// where within <see cref="LinearFit.LeverageOneTolerance"/> of 1.</param>
/// <param name="StudentizedInternal">eᵢ / (σ̂ √(1 − hᵢᵢ)); NaN where the leverage is 1 or σ̂ is NaN or 0.</param>
/// <param name="StudentizedExternal">eᵢ / (σ̂₍ᵢ₎ √(1 − hᵢᵢ)) with σ̂₍ᵢ₎² = (RSS − eᵢ²/(1 − hᵢᵢ)) / (n − r − 1), the
/// residual variance with row i deleted; NaN where the leverage is 1, σ̂ is NaN or 0, or n − r &lt; 2; ±∞ where the
/// deleted-case variance is 0 (row i carries the whole RSS).</param>
/// <param name="CooksDistance">tᵢ² hᵢᵢ / (r (1 − hᵢᵢ)) with tᵢ the internally studentized residual; NaN where tᵢ is
/// or r = 0.</param>
public sealed record LinearFitResult(
    double[] Coefficients,
    double[] StandardErrors,
    int[] Aliased,
    int[] EstimableColumns,
    int Rank,
    double RankTolerance,
    int ResidualDf,
    double ResidualSumOfSquares,
    double ResidualSd,
    double[] Fitted,
    double[] Residuals,
    double[] Leverage,
    double[] StudentizedInternal,
    double[] StudentizedExternal,
    double[] CooksDistance);
