using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Statistics;

/// <summary>The bucketed order of absolute deviations against a full sort of (deviation, group) pairs, the definition
/// of the order Fligner-Killeen ranks (common practice, no source): continuous data, decimal data full of ties, a gross
/// outlier, exact zeros and deviations far below the buckets, many groups, and the whole-key path of small samples.</summary>
public sealed class DeviationOrderTests
{
    public static TheoryData<string, int, int> Shapes => new()
    {
        { "normal", 300_000, 3000 },
        { "decimal", 300_000, 500 },
        { "outlier", 200_000, 100 },
        { "tiny", 150_000, 40 },
        { "many groups", 400_000, 100_000 },
        { "small", 5000, 50 },
    };

    [Theory]
    [MemberData(nameof(Shapes))]
    public void Deviations_come_in_ascending_order_each_with_its_own_group(string shape, int n, int groups)
    {
        var random = new Random(n + groups);
        var starts = Enumerable.Range(0, groups + 1).Select(g => (int)((long)n * g / groups)).ToArray();
        var values = new double[n];
        for (var i = 0; i < n; i++)
        {
            var normal = Math.Sqrt(-2 * Math.Log(1 - random.NextDouble())) * Math.Cos(2 * Math.PI * random.NextDouble());
            values[i] = shape switch
            {
                "decimal" => Math.Round(50 + (3 * normal), 3),
                "outlier" => i == n / 2 ? 1e9 : normal,
                "tiny" => i % 3 == 0 ? 1.0 : i % 3 == 1 ? 1.0 + (normal * 1e-12) : 1.0 + normal,
                _ => 10 + normal,
            };
        }

        var part = new GroupedValues(values, starts);
        var centres = Enumerable.Range(0, groups).Select(g => Descriptive.Median(part.Group(g))).ToArray();
        var expected = new List<(double Value, int Group)>(n);
        for (var g = 0; g < groups; g++)
        {
            foreach (var y in part.Group(g))
            {
                expected.Add((Math.Abs(y - centres[g]), g));
            }
        }

        expected.Sort();
        var order = DeviationOrder.Sort(part, centres, everyKeyKept: n < RadixSort.Threshold);
        Assert.Equal(n, order.Count);
        var actual = new List<(double Value, int Group)>(n);
        var bucket = order.BucketOf(0);
        for (var j = 0; j < n; j++)
        {
            var value = order.At(j, ref bucket, out var group);
            Assert.True(j == 0 || value >= actual[^1].Value, $"position {j} is below the one before it");
            actual.Add((value, group));
        }

        actual.Sort(); // equal deviations may come in any group order
        Assert.Equal(expected, actual);
    }

    [Fact]
    public void The_bucket_of_a_position_is_found_from_anywhere_in_the_order()
    {
        var random = new Random(5);
        var values = Enumerable.Range(0, 100_000).Select(_ => random.NextDouble() * 100).ToArray();
        var part = new GroupedValues(values, [0, 50_000, 100_000]);
        var order = DeviationOrder.Sort(part, [50.0, 50.0]);
        var walk = order.BucketOf(0);
        for (var j = 0; j < order.Count; j += 997)
        {
            var hint = order.BucketOf(j);
            var fromStart = order.At(j, ref walk, out var g1);
            Assert.Equal(fromStart, order.At(j, ref hint, out var g2));
            Assert.Equal(g1, g2);
        }
    }

    [Fact]
    public void Deviations_that_are_all_zero_are_all_kept_whole()
    {
        var part = new GroupedValues(Enumerable.Repeat(3.5, 70_000).ToArray(), [0, 35_000, 70_000]);
        var order = DeviationOrder.Sort(part, [3.5, 3.5]);
        var bucket = order.BucketOf(0);
        Assert.Equal(70_000, order.Count);
        Assert.All(Enumerable.Range(0, order.Count), j => Assert.Equal(0.0, order.At(j, ref bucket, out _)));
    }
}
