using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Support;

/// <summary>Random grouped samples for the spread tests: empty groups, singletons, pairs, odd and even sizes on both
/// sides of 64 (sort or selection for the median), values rounded to a few decimals (ties within and across groups),
/// many constant leading digits in some groups, and optionally a group of equal values.</summary>
internal static class SpreadSamples
{
    public static GroupedValues Draw(Random random, int groups, int largest, bool zeroSpread)
    {
        var list = new List<double[]>();
        for (var g = 0; g < groups; g++)
        {
            var size = random.Next(8) switch
            {
                0 => random.Next(3),
                1 => 2 * random.Next(1, 40),
                _ => random.Next(3, largest + 1),
            };
            var decimals = random.Next(4);
            var origin = random.Next(4) == 0 ? 1e6 : 0.0;
            var spread = Math.Exp(random.NextDouble() * 3);
            var values = new double[size];
            for (var i = 0; i < size; i++)
            {
                values[i] = origin + Math.Round(spread * ((random.NextDouble() * 2) - 1), decimals);
            }

            list.Add(values);
        }

        if (zeroSpread)
        {
            list.Insert(random.Next(list.Count + 1), [2.5, 2.5, 2.5, 2.5, 2.5]);
        }

        return GroupedValues.FromGroups(list);
    }
}
