namespace CellCheck.Core.Remedies;

/// <summary>
/// The maximum-likelihood power of a transformation family for one response and model: λ̂, the profile
/// log-likelihood there, and the 95% profile-likelihood interval {λ : 2(ℓ(λ̂) − ℓ(λ)) ≤ χ²₁(0.95)} around λ̂.
/// An interval end is null when the likelihood does not drop by the cut inside the search range: the interval
/// reaches at least to that end of the range.
/// </summary>
/// <param name="Family">The transformation family.</param>
/// <param name="Model">The model whose residuals the likelihood uses, in words.</param>
/// <param name="N">Rows used.</param>
/// <param name="ResidualDf">Rows minus the model's rank.</param>
/// <param name="Lambda">λ̂.</param>
/// <param name="LogLikelihood">The profile log-likelihood at λ̂ (see <see cref="BoxCox.LogLikelihood(ReadOnlySpan{double}, double)"/>).</param>
/// <param name="CiLower">Lower end of the 95% interval, or null below <paramref name="SearchLower"/>.</param>
/// <param name="CiUpper">Upper end of the 95% interval, or null above <paramref name="SearchUpper"/>.</param>
/// <param name="SearchLower">Smallest λ searched.</param>
/// <param name="SearchUpper">Largest λ searched.</param>
/// <param name="Shift">The constant added to every value before transforming (0 when none was stated).</param>
public sealed record PowerFit(
    PowerFamily Family,
    string Model,
    int N,
    int ResidualDf,
    double Lambda,
    double LogLikelihood,
    double? CiLower,
    double? CiUpper,
    double SearchLower,
    double SearchUpper,
    double Shift)
{
    /// <summary>The confidence level of the interval.</summary>
    public const double Level = 0.95;

    /// <summary>True when λ̂ lies on an end of the search range (the likelihood still rises beyond it).</summary>
    public bool AtSearchBound => Lambda <= SearchLower || Lambda >= SearchUpper;

    /// <summary>True when <paramref name="lambda"/> is inside the interval (an open end counts as unbounded).</summary>
    public bool Contains(double lambda) =>
        (CiLower is not { } lo || lambda >= lo) && (CiUpper is not { } hi || lambda <= hi);
}
