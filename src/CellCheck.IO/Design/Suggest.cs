namespace CellCheck.IO.Design;

/// <summary>Finds the closest known word to a misspelt one (Levenshtein distance, at most 2 or a third of the length).</summary>
internal static class Suggest
{
    public static string? Closest(string word, IEnumerable<string> candidates)
    {
        string? best = null;
        var bestDistance = int.MaxValue;
        foreach (var c in candidates)
        {
            var d = Distance(word.ToLowerInvariant(), c.ToLowerInvariant());
            if (d < bestDistance)
            {
                best = c;
                bestDistance = d;
            }
        }

        return bestDistance <= Math.Max(2, word.Length / 3) ? best : null;
    }

    private static int Distance(string a, string b)
    {
        var previous = new int[b.Length + 1];
        var current = new int[b.Length + 1];
        for (var j = 0; j <= b.Length; j++)
        {
            previous[j] = j;
        }

        for (var i = 1; i <= a.Length; i++)
        {
            current[0] = i;
            for (var j = 1; j <= b.Length; j++)
            {
                var cost = a[i - 1] == b[j - 1] ? 0 : 1;
                current[j] = Math.Min(Math.Min(current[j - 1] + 1, previous[j] + 1), previous[j - 1] + cost);
            }

            (previous, current) = (current, previous);
        }

        return previous[b.Length];
    }
}
