namespace CellCheck.Core.Remedies;

/// <summary>
/// A profile log-likelihood that keeps the values it has computed, keyed by the exact bits of λ: the search asks
/// again for points it already has (the bracket ends of each interval root search are grid points or λ̂, and λ̂ is
/// the last point the refinement evaluated), and each evaluation of a large design's profile is costly. The values
/// returned are the same doubles the function gives, so the search takes the same path. Safe to call side by side
/// when the function is: the table is locked only to look up and to record.
/// </summary>
internal sealed class RememberedProfile(Func<double, double> logLikelihood)
{
    private readonly Dictionary<long, double> known = [];

    /// <summary>ℓ(λ), computed once per distinct λ.</summary>
    public double At(double lambda)
    {
        var key = BitConverter.DoubleToInt64Bits(lambda);
        lock (known)
        {
            if (known.TryGetValue(key, out var value))
            {
                return value;
            }
        }

        var computed = logLikelihood(lambda);
        lock (known)
        {
            known.TryAdd(key, computed);
        }

        return computed;
    }

    /// <summary>Distinct λ evaluated so far.</summary>
    public int Evaluations
    {
        get
        {
            lock (known)
            {
                return known.Count;
            }
        }
    }
}
