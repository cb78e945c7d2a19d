using CellCheck.Core.Remedies;

namespace CellCheck.Core.Models;

/// <summary>The squared fitted values ŷ², each read on demand as (value − residual)².</summary>
internal readonly struct FittedSquares(double[] values, double[] residuals) : IIndexedValues
{
    public double this[int i]
    {
        get
        {
            var fitted = values[i] - residuals[i];
            return fitted * fitted;
        }
    }
}
