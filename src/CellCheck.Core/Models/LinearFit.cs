namespace CellCheck.Core.Models;

/// <summary>
/// Linear least squares by Householder QR with column pivoting (Businger &amp; Golub 1965, "Linear least squares
/// solutions by Householder transformations", Numer. Math. 7, 269-276), in double precision, with a numerical rank
/// decision, one step of iterative refinement and the usual case diagnostics.
/// </summary>
/// <remarks>
/// <para>Each column of X is first divided by its Euclidean norm (equilibration, van der Sluis 1969, Numer. Math.
/// 14, 14-23): the pivoting compares column norms, and unscaled polynomial columns such as x¹⁰ next to 1 would
/// otherwise be chosen for their units, not for their information. Coefficients are divided by the same norms
/// afterwards.</para>
/// <para>Rank: the pivoted diagonal of R never increases; the columns from the first |R_kk| &lt; tolerance × |R₀₀|
/// on are aliased (coefficient and standard error NaN), and the estimable part is the basic solution on the first r
/// pivoted columns. After scaling |R₀₀| = 1. The default tolerance, 10·n·ε, is a small multiple of the backward
/// error of Householder QR, which grows with n·ε per column (Higham 2002, Accuracy and Stability of Numerical
/// Algorithms, 2nd ed., §19.3): a diagonal that small cannot be told apart from an exact dependency, while an
/// ill-conditioned design keeps all its columns (NIST's Filip, the hardest StRD regression, has a smallest scaled
/// |R_kk| of 1e-9, against 1.8e-13 for its n = 82). It is far stricter than the 1e-7 of R's lm, which on Filip's
/// unscaled polynomial columns declares x¹⁰ aliased.</para>
/// <para>Refinement: one step of iterative refinement through the augmented system (Björck 1967,
/// <see cref="AugmentedRefinement"/>), with residuals accumulated in double-double arithmetic
/// (<see cref="CompensatedProducts"/>); the fitted values and residuals are then formed once more in double-double
/// from the refined β. Measured on the NIST StRD regression files (log relative error of the coefficients): without
/// refinement Wampler5 reaches 6.4 digits, Wampler4 8.5, Wampler1 9.3, Filip 7.3; refining β alone from the
/// double-double residual (Golub &amp; Wilkinson 1966) left Wampler5 at 6.4, because its large residual makes the
/// error grow with κ²; the augmented step brings Wampler1-5 to 13.2 digits or more and Filip to 7.9, which is the
/// accuracy of the exact least-squares solution of Filip's data once rounded to double. A second step changed no
/// result.</para>
/// <para>Leverages are the squared row norms of the thin Q of the kept columns; a leverage within
/// <see cref="LeverageOneTolerance"/> of 1 is set to 1, its residual to exactly 0 and its studentized residuals and
/// Cook's distance to NaN: such a row is fitted by a column of its own and carries no information about the error.
/// Cost: about 2np² flops for the factorization, np² more for recomputing the pivot norms, about 4nr² for the
/// leverages and a few passes over X for the refinement; memory: one n × p copy of X and a few vectors of length n
/// besides the results.</para>
/// </remarks>
public static class LinearFit
{
    /// <summary>A leverage this close to 1 is taken as exactly 1: the row is fitted exactly, its residual is 0 and
    /// its studentized residuals and Cook's distance are not usable (NaN).</summary>
    public const double LeverageOneTolerance = 1e-10;

    /// <summary>Machine epsilon ε = 2⁻⁵², the spacing of doubles at 1 (not <see cref="double.Epsilon"/>, the smallest subnormal).</summary>
    private const double DoubleEpsilon = 2.220446049250313e-16;

    /// <summary>Fits y ≈ Xβ by least squares. X is n × p and holds an intercept column only if the caller adds one.</summary>
    /// <param name="x">The design, n × p, row i for observation i.</param>
    /// <param name="y">The response, n values.</param>
    /// <param name="rankTolerance">Relative tolerance for the rank decision (default 10·n·ε); in [0, 1).</param>
    /// <exception cref="ArgumentException">Sizes disagree, X or y is empty, a value is not finite, or the tolerance is
    /// out of range.</exception>
    public static LinearFitResult Fit(double[,] x, double[] y, double? rankTolerance = null)
    {
        ArgumentNullException.ThrowIfNull(x);
        ArgumentNullException.ThrowIfNull(y);
        FitInput.Validate(x, y, rankTolerance);
        int n = y.Length, p = x.GetLength(1);
        var tolerance = rankTolerance ?? 10 * n * DoubleEpsilon;
        var qr = PivotedQr.Factor(x, tolerance);
        var r = qr.Rank;
        var columns = qr.Pivot.AsSpan(0, r).ToArray();
        var b = new double[r];
        var fitted = new double[n];
        var residuals = new double[n];
        Solve(qr, y, b);
        CompensatedProducts.FitAndResidual(x, y, columns, b, fitted, residuals);
        AugmentedRefinement.Refine(qr, x, y, columns, b, residuals);
        CompensatedProducts.FitAndResidual(x, y, columns, b, fitted, residuals);

        var leverage = QrSummaries.Leverage(qr);
        for (var i = 0; i < n; i++)
        {
            if (Math.Abs(1 - leverage[i]) < LeverageOneTolerance)
            {
                leverage[i] = 1;
                residuals[i] = 0;
                fitted[i] = y[i];
            }
        }

        var df = n - r;
        var rss = CompensatedProducts.SumOfSquares(residuals);
        var sigma = df > 0 ? Math.Sqrt(rss / df) : double.NaN;
        var coefficients = new double[p];
        var errors = new double[p];
        Array.Fill(coefficients, double.NaN);
        Array.Fill(errors, double.NaN);
        var gram = QrSummaries.InverseGramDiagonal(qr);
        for (var k = 0; k < r; k++)
        {
            coefficients[columns[k]] = b[k];
            errors[columns[k]] = sigma * Math.Sqrt(gram[k]) / qr.Scale[columns[k]];
        }

        var internalT = new double[n];
        var externalT = new double[n];
        var cooks = new double[n];
        CaseDiagnostics.Compute(residuals, leverage, rss, df, r, internalT, externalT, cooks);
        var kept = columns.Order().ToArray();
        var aliased = Enumerable.Range(0, p).Except(kept).ToArray();
        return new LinearFitResult(coefficients, errors, aliased, kept, r, tolerance, df, rss, sigma, fitted, residuals,
            leverage, internalT, externalT, cooks);
    }

    /// <summary>The estimable columns of <paramref name="x"/> (<see cref="LinearFitResult.EstimableColumns"/>), in
    /// their original order: a full-rank design with the same column space, for statistics that need one.</summary>
    /// <exception cref="ArgumentException">X does not have the fit's number of columns.</exception>
    public static double[,] EstimableDesign(double[,] x, LinearFitResult fit)
    {
        ArgumentNullException.ThrowIfNull(x);
        ArgumentNullException.ThrowIfNull(fit);
        if (x.GetLength(1) != fit.Coefficients.Length)
        {
            throw new ArgumentException($"X has {x.GetLength(1)} columns but the fit has {fit.Coefficients.Length}.", nameof(x));
        }

        var n = x.GetLength(0);
        var kept = fit.EstimableColumns;
        var design = new double[n, kept.Length];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < kept.Length; j++)
            {
                design[i, j] = x[i, kept[j]];
            }
        }

        return design;
    }

    /// <summary>Solves the least-squares problem on the first r pivoted columns for right-hand side
    /// <paramref name="rhs"/> and writes β, in the units of X, to <paramref name="b"/>.</summary>
    private static void Solve(PivotedQr qr, double[] rhs, double[] b)
    {
        var c = (double[])rhs.Clone();
        qr.ApplyQt(c);
        qr.SolveUpper(c);
        for (var k = 0; k < b.Length; k++)
        {
            b[k] = c[k] / qr.Scale[qr.Pivot[k]];
        }
    }
}
