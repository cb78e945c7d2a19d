namespace CellCheck.Core.Models;

/// <summary>
/// Decides which columns of a design matrix are estimable taking them in order: a column is aliased when it lies in
/// the span of the columns kept before it. With blocks first and terms in order of degree, the interaction
/// confounded with blocks is the one reported, as in the classical analysis of a confounded factorial. Modified Gram-Schmidt with one re-orthogonalisation ("twice is enough", Giraud et al. 2005);
/// aliased when the remaining norm is below <see cref="Tolerance"/> of the column's own norm.
/// </summary>
public static class OrderedRank
{
    /// <summary>Relative norm below which a column counts as dependent on the earlier ones (design columns are 0/1
    /// indicators, their products and centred numeric values: far from this bound unless truly dependent).</summary>
    public const double Tolerance = 1e-9;

    public static int[] KeptColumns(double[,] x)
    {
        ArgumentNullException.ThrowIfNull(x);
        var n = x.GetLength(0);
        var p = x.GetLength(1);
        var basis = new List<double[]>();
        var kept = new List<int>();
        for (var j = 0; j < p; j++)
        {
            var v = new double[n];
            for (var i = 0; i < n; i++)
            {
                v[i] = x[i, j];
            }

            var norm = Norm(v);
            if (norm == 0)
            {
                continue;
            }

            for (var pass = 0; pass < 2; pass++)
            {
                foreach (var q in basis)
                {
                    var dot = 0.0;
                    for (var i = 0; i < n; i++)
                    {
                        dot += q[i] * v[i];
                    }

                    for (var i = 0; i < n; i++)
                    {
                        v[i] -= dot * q[i];
                    }
                }
            }

            var rest = Norm(v);
            if (rest > Tolerance * norm)
            {
                for (var i = 0; i < n; i++)
                {
                    v[i] /= rest;
                }

                basis.Add(v);
                kept.Add(j);
            }
        }

        return [.. kept];
    }

    private static double Norm(double[] v)
    {
        var s = 0.0;
        foreach (var a in v)
        {
            s += a * a;
        }

        return Math.Sqrt(s);
    }
}
