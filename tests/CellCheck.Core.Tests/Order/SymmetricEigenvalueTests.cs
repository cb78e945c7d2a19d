using CellCheck.Core.Order;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.Random;

namespace CellCheck.Core.Tests.Order;

public sealed class SymmetricEigenvalueTests
{
    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(17)]
    [InlineData(60)]
    public void Householder_reduction_and_bisection_agree_with_mathnet_on_random_symmetric_matrices(int n)
    {
        var random = new Xoshiro256StarStar(n);
        var full = Matrix<double>.Build.Dense(n, n);
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j <= i; j++)
            {
                full[i, j] = full[j, i] = (2 * random.NextDouble()) - 1;
            }
        }

        var ours = Eigenvalues(full);
        var reference = full.Evd(Symmetricity.Symmetric).EigenValues.Select(v => v.Real).Order().ToArray();

        // both methods are backward stable: eigenvalue errors of a few ε‖A‖ each (‖A‖ ≤ n here), so 1e-13·n
        for (var i = 0; i < n; i++)
        {
            Assert.True(Math.Abs(ours[i] - reference[i]) <= 1e-13 * n, $"eigenvalue {i}: {ours[i]:R} vs {reference[i]:R}");
        }
    }

    [Fact]
    public void Repeated_eigenvalues_and_an_already_tridiagonal_column_are_handled()
    {
        // Q diag(1, 1, 1, 3, 3, −2) Qᵀ for an orthogonal Q from a QR factorization: exact eigenvalues known
        var random = new Xoshiro256StarStar(5);
        var q = Matrix<double>.Build.Dense(6, 6, (_, _) => random.NextDouble()).QR().Q;
        var full = q * Matrix<double>.Build.DiagonalOfDiagonalArray([1, 1, 1, 3, 3, -2]) * q.Transpose();
        var blockDiagonal = Matrix<double>.Build.DiagonalOfDiagonalArray([4, 0, 0, 2]);

        // 1e-13: backward error of a few ε‖A‖ with ‖A‖ = 3 (and the rounding of Q D Qᵀ itself)
        Assert.All(Eigenvalues(full).Zip([-2.0, 1, 1, 1, 3, 3]), t => Assert.True(Math.Abs(t.First - t.Second) < 1e-13, $"{t.First:R} vs {t.Second}"));
        // already diagonal: no reflection is applied, and bisection stops within 4ε‖T‖ ≈ 4e-15 of each eigenvalue
        Assert.All(Eigenvalues(blockDiagonal).Zip([0.0, 0, 2, 4]), t => Assert.True(Math.Abs(t.First - t.Second) < 4e-15, $"{t.First:R} vs {t.Second}"));
    }

    [Fact]
    public void The_projected_difference_matrix_has_the_eigenvalues_of_the_first_difference_matrix_when_the_design_is_empty()
    {
        // M = I: the eigenvalues of A are 2 − 2cos(πj/n), j = 0..n − 1 (e.g. the DCT-II basis diagonalizes A)
        const int n = 12;
        var lambda = new DurbinWatsonDistribution(ProjectedDifference.FromDesign(new double[n, 0])).Eigenvalues();

        for (var j = 0; j < n; j++)
        {
            Assert.True(Math.Abs((2 - (2 * Math.Cos(Math.PI * j / n))) - lambda[j]) < 1e-14, $"j = {j}"); // a few ε·‖A‖ (‖A‖ ≤ 4)
        }
    }

    private static double[] Eigenvalues(Matrix<double> full)
    {
        var n = full.RowCount;
        var lower = new double[n][];
        for (var i = 0; i < n; i++)
        {
            lower[i] = new double[i + 1];
            for (var j = 0; j <= i; j++)
            {
                lower[i][j] = full[i, j];
            }
        }

        var (d, e) = HouseholderTridiagonal.Reduce(lower);
        return TridiagonalEigenvalues.Ascending(d, e);
    }
}
