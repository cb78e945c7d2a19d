namespace CellCheck.Core.Cells;

/// <summary>Builds the <see cref="Census"/> of a <see cref="CellPartition"/>.</summary>
public static class CensusBuilder
{
    /// <summary>At most this many empty combinations are listed by name; the rest are counted.</summary>
    public const int EmptyListLimit = 200;

    public static Census Build(CellPartition partition)
    {
        ArgumentNullException.ThrowIfNull(partition);
        var factors = partition.Factors;
        double combinations = 1;
        foreach (var f in factors)
        {
            combinations *= f.Levels.Count;
        }

        var min = int.MaxValue;
        var max = 0;
        var singletons = 0;
        for (var c = 0; c < partition.CellCount; c++)
        {
            var n = partition.Size(c);
            min = Math.Min(min, n);
            max = Math.Max(max, n);
            if (n == 1)
            {
                singletons++;
            }
        }

        if (partition.CellCount == 0)
        {
            min = 0;
        }

        var emptyCount = (int)Math.Min(int.MaxValue, combinations - partition.CellCount);
        var empty = ListEmpty(partition, Math.Min(emptyCount, EmptyListLimit));
        var balanced = emptyCount == 0 && partition.CellCount > 0 && min == max;
        return new Census(partition.CellCount, combinations, emptyCount, empty, singletons, min, max, balanced, partition.Values.Count);
    }

    private static List<IReadOnlyList<string>> ListEmpty(CellPartition partition, int limit)
    {
        var result = new List<IReadOnlyList<string>>();
        var factors = partition.Factors;
        if (limit == 0 || factors.Count == 0)
        {
            return result;
        }

        // Walk the full factorial in lexicographic order beside the (equally ordered) observed cells.
        var codes = new int[factors.Count];
        var cell = 0;
        while (result.Count < limit)
        {
            if (cell < partition.CellCount && Matches(partition, cell, codes))
            {
                cell++;
            }
            else
            {
                var labels = new string[codes.Length];
                for (var f = 0; f < codes.Length; f++)
                {
                    labels[f] = factors[f].Levels[codes[f]];
                }

                result.Add(labels);
            }

            if (!Advance(codes, factors))
            {
                break;
            }
        }

        return result;
    }

    private static bool Matches(CellPartition partition, int cell, int[] codes)
    {
        for (var f = 0; f < codes.Length; f++)
        {
            if (partition.LevelCode(cell, f) != codes[f])
            {
                return false;
            }
        }

        return true;
    }

    private static bool Advance(int[] codes, IReadOnlyList<Data.FactorColumn> factors)
    {
        for (var f = codes.Length - 1; f >= 0; f--)
        {
            if (++codes[f] < factors[f].Levels.Count)
            {
                return true;
            }

            codes[f] = 0;
        }

        return false;
    }
}
