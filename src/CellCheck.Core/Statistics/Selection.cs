namespace CellCheck.Core.Statistics;

/// <summary>
/// The k-th smallest value of a span by Hoare's selection ("Find", Communications of the ACM 4, 1961, 321-322) with a
/// median-of-three pivot, falling back to a full sort when partitioning degenerates: expected linear time.
/// The span is reordered so that every value before k is ≤ the result and every value after is ≥ it. No NaN.
/// </summary>
internal static class Selection
{
    public static double Select(Span<double> values, int k)
    {
        var low = 0;
        var high = values.Length - 1;
        var budget = 2 * (64 - long.LeadingZeroCount(values.Length));
        while (high - low > 16)
        {
            if (--budget < 0)
            {
                values[low..(high + 1)].Sort();
                return values[k];
            }

            var middle = low + ((high - low) / 2);
            Order(values, low, middle);
            Order(values, low, high);
            Order(values, middle, high);
            var pivot = values[middle];
            int i = low, j = high;
            while (i <= j)
            {
                while (values[i] < pivot)
                {
                    i++;
                }

                while (values[j] > pivot)
                {
                    j--;
                }

                if (i <= j)
                {
                    (values[i], values[j]) = (values[j], values[i]);
                    i++;
                    j--;
                }
            }

            if (k <= j)
            {
                high = j;
            }
            else if (k >= i)
            {
                low = i;
            }
            else
            {
                return values[k];
            }
        }

        values[low..(high + 1)].Sort();
        return values[k];
    }

    private static void Order(Span<double> values, int a, int b)
    {
        if (values[a] > values[b])
        {
            (values[a], values[b]) = (values[b], values[a]);
        }
    }
}
