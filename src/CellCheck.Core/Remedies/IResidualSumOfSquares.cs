namespace CellCheck.Core.Remedies;

/// <summary>
/// The residual sum of squares of any response vector on one fixed model whose column space holds the constant
/// vector, set up once and evaluated for many transformed responses (one per λ of a profile likelihood).
/// </summary>
internal interface IResidualSumOfSquares
{
    /// <summary>Number of rows.</summary>
    int Count { get; }

    /// <summary>Rows minus the rank of the model.</summary>
    int ResidualDf { get; }

    /// <summary>‖(I − H) v‖² for the model's hat matrix H; <paramref name="v"/> is not changed.</summary>
    double Of(ReadOnlySpan<double> v);
}
