namespace CellCheck.Core.Remedies;

/// <summary>
/// The logs of the groups that the Box-Cox power sums may have to evaluate row by row (<see cref="BlockEvaluation"/>):
/// those whose centred logs reach beyond 1/|λ| somewhere in the search range, |λ| ≤ <see cref="LambdaLimit"/>. Every
/// other group is evaluated from its power sums at every λ of the range, so its logs are not kept once the sums are
/// formed: on data of modest spread none are, and the profile's evaluations then hold no array of the data's length.
/// </summary>
/// <remarks>The series of a group that is not kept always converges within its stored terms inside the range: the
/// terms are chosen by <see cref="GroupedPowerSums.TermsWithin"/> at the largest |λ|, and the stopping bound at a
/// smaller |λ| is a product of smaller factors (rounding is monotone), so it falls below the stopping level no later.</remarks>
internal sealed class KeptLogs
{
    /// <summary>The largest |λ| at which the profile is evaluated: the end of the search range farther from zero.</summary>
    public static readonly double LambdaLimit = Math.Max(-BoxCox.SearchLower, BoxCox.SearchUpper);

    /// <summary>Largest group whose transformed values <see cref="RowByRow"/> keeps on the stack.</summary>
    private const int StackRows = 256;

    private readonly double[]?[] byGroup;

    /// <param name="byGroup">The logs of each group that is <see cref="Far"/>, null for every other group.</param>
    public KeptLogs(double[]?[] byGroup)
    {
        this.byGroup = byGroup;
        Count = byGroup.Sum(logs => logs?.Length ?? 0);
    }

    /// <summary>Number of logs kept.</summary>
    public int Count { get; }

    /// <summary>The <paramref name="n"/> logs of group <paramref name="g"/>.</summary>
    /// <exception cref="InvalidOperationException">The group's logs were not kept (a programming error: see the remarks).</exception>
    public ReadOnlySpan<double> Of(int g, int n) => byGroup[g] is { } logs
        ? logs.AsSpan(0, n)
        : throw new InvalidOperationException($"group {g} was not expected to need its logs inside the search range");

    /// <summary>Σu and Σu² − (Σu)²/n for group g of n rows, log-mean <paramref name="centre"/>, row by row, with
    /// u = expm1(λe)/λ and e = log y − centre.</summary>
    public (double Sum, double Squares) RowByRow(int g, int n, double centre, double lambda)
    {
        var cell = Of(g, n);
        var rented = n > StackRows ? System.Buffers.ArrayPool<double>.Shared.Rent(n) : null;
        var u = rented is null ? stackalloc double[StackRows] : rented.AsSpan();
        double sum = 0, squares = 0;
        for (var i = 0; i < n; i++)
        {
            u[i] = PreciseMath.ExpM1(lambda * (cell[i] - centre)) / lambda;
            sum += u[i];
        }

        var mean = sum / n;
        for (var i = 0; i < n; i++)
        {
            var d = u[i] - mean;
            squares += d * d;
        }

        if (rented is not null)
        {
            System.Buffers.ArrayPool<double>.Shared.Return(rented);
        }

        return (sum, squares);
    }

    /// <summary>True when a group of this reach leaves the series' reach somewhere in the search range: |λ|·reach &gt; 1
    /// at |λ| = <see cref="LambdaLimit"/>, as <see cref="BlockEvaluation"/> tests it.</summary>
    public static bool Far(double reach) => LambdaLimit * reach > 1;
}
