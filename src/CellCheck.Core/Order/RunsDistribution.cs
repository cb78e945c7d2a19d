namespace CellCheck.Core.Order;

/// <summary>
/// The exact null distribution of the number of runs R in a random arrangement of n1 symbols of one kind and n2 of
/// the other, all C(n1 + n2, n1) arrangements equally likely (Swed &amp; Eisenhart 1943, "Tables for testing
/// randomness of grouping in a sequence of alternatives", Ann. Math. Statist. 14, 66-87):
/// #(R = 2k) = 2 C(n1 − 1, k − 1) C(n2 − 1, k − 1) and
/// #(R = 2k + 1) = C(n1 − 1, k) C(n2 − 1, k − 1) + C(n1 − 1, k − 1) C(n2 − 1, k).
/// Counts are exact 64-bit integers for n1 + n2 ≤ 60.
/// </summary>
internal static class RunsDistribution
{
    /// <summary>Largest n1 + n2 whose counts are held exactly (C(60, 30) ≈ 1.2e17 &lt; 2⁶³).</summary>
    internal const int MaxTotal = 60;

    /// <summary>The number of arrangements with exactly <paramref name="runs"/> runs.</summary>
    internal static long Count(int n1, int n2, int runs)
    {
        if (runs < 2)
        {
            return 0;
        }

        var k = runs / 2;
        return runs % 2 == 0
            ? 2 * Binomial(n1 - 1, k - 1) * Binomial(n2 - 1, k - 1)
            : (Binomial(n1 - 1, k) * Binomial(n2 - 1, k - 1)) + (Binomial(n1 - 1, k - 1) * Binomial(n2 - 1, k));
    }

    /// <summary>min(1, 2 min(P(R ≤ r), P(R ≥ r))), the doubled smaller tail.</summary>
    internal static double TwoSidedP(int n1, int n2, int runs)
    {
        if (n1 < 1 || n2 < 1 || n1 + n2 > MaxTotal)
        {
            throw new ArgumentOutOfRangeException(nameof(n1), "The exact runs distribution needs 1 ≤ n1, n2 and n1 + n2 ≤ 60.");
        }

        long lower = 0;
        long upper = 0;
        var most = 2 * Math.Min(n1, n2) + 1;
        for (var r = 2; r <= most; r++)
        {
            var count = Count(n1, n2, r);
            lower += r <= runs ? count : 0;
            upper += r >= runs ? count : 0;
        }

        double total = Binomial(n1 + n2, n1);
        return Math.Min(1.0, 2.0 * Math.Min(lower, upper) / total);
    }

    /// <summary>C(n, k) by the multiplicative formula; each partial product C(n − k + i, i) is an integer.</summary>
    internal static long Binomial(int n, int k)
    {
        if (k < 0 || n < 0 || k > n)
        {
            return 0;
        }

        k = Math.Min(k, n - k);
        long result = 1;
        for (var i = 1; i <= k; i++)
        {
            result = result * (n - k + i) / i;
        }

        return result;
    }
}
