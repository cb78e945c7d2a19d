namespace CellCheck.Core.Models;

/// <summary>Argument checks for <see cref="LinearFit.Fit"/>: a wrong call is a programming error and throws.</summary>
internal static class FitInput
{
    public static void Validate(double[,] x, double[] y, double? rankTolerance)
    {
        if (y.Length == 0 || x.GetLength(1) == 0)
        {
            throw new ArgumentException("X needs at least one row and one column.", nameof(x));
        }

        if (x.GetLength(0) != y.Length)
        {
            throw new ArgumentException($"X has {x.GetLength(0)} rows but y has {y.Length} values.", nameof(y));
        }

        if (rankTolerance is { } t && !(t >= 0 && t < 1))
        {
            throw new ArgumentException("The rank tolerance must be in [0, 1).", nameof(rankTolerance));
        }

        foreach (var v in x)
        {
            if (!double.IsFinite(v))
            {
                throw new ArgumentException("X holds a value that is not finite.", nameof(x));
            }
        }

        foreach (var v in y)
        {
            if (!double.IsFinite(v))
            {
                throw new ArgumentException("y holds a value that is not finite.", nameof(y));
            }
        }
    }
}
