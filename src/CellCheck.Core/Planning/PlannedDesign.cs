using CellCheck.Core.Models;

namespace CellCheck.Core.Planning;

/// <summary>
/// A balanced factorial design for planning: every combination of the factors' levels holds n rows, the model is the
/// intercept plus <see cref="Terms"/>, and when <see cref="Blocked"/> each replicate is one complete block (an extra
/// n − 1 degrees of freedom for blocks, as in a randomized complete block design).
/// </summary>
public sealed record PlannedDesign(IReadOnlyList<PlannedFactor> Factors, IReadOnlyList<ModelTerm> Terms, bool Blocked = false)
{
    /// <summary>Number of cells: the product of the level counts.</summary>
    public int Cells => Factors.Aggregate(1, (p, f) => checked(p * f.Levels));

    /// <summary>Numerator degrees of freedom of a term: the product of its factors' degrees of freedom.</summary>
    public int TermDf(ModelTerm term)
    {
        ArgumentNullException.ThrowIfNull(term);
        return term.Factors.Aggregate(1, (p, f) => p * Factors[f].Df);
    }

    /// <summary>"a" or "a*b".</summary>
    public string TermName(ModelTerm term)
    {
        ArgumentNullException.ThrowIfNull(term);
        return string.Join("*", term.Factors.Select(f => Factors[f].Name));
    }

    /// <summary>Number of model parameters besides blocks: the intercept and every term's degrees of freedom.</summary>
    public int Parameters => 1 + Terms.Sum(TermDf);

    /// <summary>Rows with n replicates per cell (n may be fractional when solving for it).</summary>
    public double Rows(double n) => n * Cells;

    /// <summary>Residual degrees of freedom with n replicates per cell: rows − parameters − (n − 1 if blocked).</summary>
    public double ResidualDf(double n) => Rows(n) - Parameters - (Blocked ? n - 1 : 0);

    /// <summary>The real n at which the residual degrees of freedom reach zero (infinity when they never grow with n).</summary>
    public double ZeroResidualDfReplicates
    {
        get
        {
            var perReplicate = Cells - (Blocked ? 1 : 0);
            return perReplicate > 0 ? (Parameters - (Blocked ? 1.0 : 0.0)) / perReplicate : double.PositiveInfinity;
        }
    }

    /// <summary>The smallest whole n that leaves at least one residual degree of freedom (int.MaxValue when none does).</summary>
    public int MinimumReplicates
    {
        get
        {
            var zero = ZeroResidualDfReplicates;
            if (!(zero < int.MaxValue / 2))
            {
                return int.MaxValue;
            }

            var n = Math.Max(1, (int)Math.Floor(zero));
            while (ResidualDf(n) < 1)
            {
                n++;
            }

            return n;
        }
    }
}
