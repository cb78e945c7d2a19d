namespace CellCheck.IO.Design;

/// <summary>Finds the closest known word to a misspelt one (Levenshtein distance, at most 2 or a third of the length).</summary>
internal static class Suggest
{
    /// <summary>Words longer than this get no suggestion (names are short; this bounds the work on hostile input).</summary>
    private const int MaxLength = 200;

    public static string? Closest(string word, IEnumerable<string> candidates)
    {
        var limit = Math.Max(2, word.Length / 3);
        if (word.Length > MaxLength)
        {
            return null;
        }

        string? best = null;
        var bestDistance = int.MaxValue;
        foreach (var c in candidates)
        {
            if (Math.Abs(c.Length - word.Length) > limit)
            {
                // The distance is at least the difference in length: no suggestion, and no quadratic work on long texts.
                continue;
            }

            var d = Distance(word.ToLowerInvariant(), c.ToLowerInvariant());
            if (d < bestDistance)
            {
                best = c;
                bestDistance = d;
            }
        }

        return bestDistance <= limit ? best : null;
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
