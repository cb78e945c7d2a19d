namespace CellCheck.Core.Models;

/// <summary>
/// The model fitted to a response: an intercept, the listed terms among the factors, and every block as an additive
/// term. <see cref="Full"/> is all main effects and interactions among the factors (with categorical factors and no
/// blocks this is the cell-means model); <see cref="Main"/> the main effects only.
/// </summary>
public sealed record ModelSpec(IReadOnlyList<ModelTerm> Terms)
{
    /// <summary>Every non-empty subset of the factors, by order then position.</summary>
    public static ModelSpec Full(int factorCount)
    {
        var terms = new List<ModelTerm>();
        for (var order = 1; order <= factorCount; order++)
        {
            foreach (var subset in Subsets(factorCount, order))
            {
                terms.Add(new ModelTerm(subset));
            }
        }

        return new ModelSpec(terms);
    }

    /// <summary>Main effects only.</summary>
    public static ModelSpec Main(int factorCount) => new(Enumerable.Range(0, factorCount).Select(f => new ModelTerm([f])).ToArray());

    /// <summary>True when no term joins two factors.</summary>
    public bool IsAdditive => Terms.All(t => t.Factors.Count == 1);

    /// <summary>True when this is the full factorial in <paramref name="factorCount"/> factors.</summary>
    public bool IsFull(int factorCount) => Terms.Count == (1 << factorCount) - 1
        && Terms.Select(t => string.Join(",", t.Factors.Order())).Distinct().Count() == Terms.Count;

    private static IEnumerable<int[]> Subsets(int n, int k)
    {
        var indices = Enumerable.Range(0, k).ToArray();
        while (true)
        {
            yield return [.. indices];
            var i = k - 1;
            while (i >= 0 && indices[i] == n - k + i)
            {
                i--;
            }

            if (i < 0)
            {
                yield break;
            }

            indices[i]++;
            for (var j = i + 1; j < k; j++)
            {
                indices[j] = indices[j - 1] + 1;
            }
        }
    }
}
