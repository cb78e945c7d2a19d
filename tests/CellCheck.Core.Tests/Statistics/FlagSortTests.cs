using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Statistics;

/// <summary>The in-place bucket sort of long samples against the comparison sort (the definition of ascending order;
/// common practice, no source), on the shapes that decide its buckets: both signs with long tails, one sign only, a
/// narrow range far from zero, values crowded into one bucket (sorted there by halves), tiny magnitudes below the
/// buckets, zeros of both signs, infinities and subnormals; as a span (buckets one after another) and as an array
/// (buckets side by side).</summary>
public sealed class FlagSortTests
{
    public static TheoryData<string> Shapes => new() { "normal", "cauchy", "positive", "negative", "narrow", "crowded", "tiny", "zeros", "extremes" };

    [Theory]
    [MemberData(nameof(Shapes))]
    public void Long_samples_come_out_in_the_order_of_the_comparison_sort(string shape)
    {
        var random = new Random(shape.Length * 31);
        var n = (RadixSort.Threshold * 3) + 7;
        double Normal() => Math.Sqrt(-2 * Math.Log(1 - random.NextDouble())) * Math.Cos(2 * Math.PI * random.NextDouble());
        var values = Enumerable.Range(0, n).Select(i => shape switch
        {
            "cauchy" => Math.Tan(Math.PI * (random.NextDouble() - 0.5)),
            "positive" => Math.Exp(3 * Normal()),
            "negative" => -Math.Abs(Normal()) - 1e-3,
            "narrow" => 1000 + (1e-9 * Normal()),
            "crowded" => i % 4 == 0 ? Normal() : 2.5,
            "tiny" => i % 2 == 0 ? Normal() * 1e-12 : Normal() * 1e3,
            "zeros" => i % 3 == 0 ? -0.0 : i % 3 == 1 ? 0.0 : Normal(),
            "extremes" => (i % 5) switch
            {
                0 => double.Epsilon * random.Next(-3, 4),
                1 => i % 2 == 0 ? double.PositiveInfinity : double.NegativeInfinity,
                2 => double.MaxValue * (random.NextDouble() - 0.5),
                _ => Normal(),
            },
            _ => Normal(),
        }).ToArray();
        var expected = values.OrderBy(v => v).Select(v => BitConverter.DoubleToInt64Bits(v == 0 ? 0.0 : v)).ToArray(); // −0 reads +0
        var span = (double[])values.Clone();
        RadixSort.Sort(span.AsSpan());
        Assert.Equal(expected, span.Select(BitConverter.DoubleToInt64Bits));
        var array = values.Append(-1.0).ToArray(); // a value past the length stays where it is
        RadixSort.Sort(array, n);
        Assert.Equal(expected, array.Take(n).Select(BitConverter.DoubleToInt64Bits));
        Assert.Equal(-1.0, array[n]);
    }

    [Fact]
    public void Equal_values_fill_one_bucket_and_stay_equal()
    {
        var values = Enumerable.Repeat(-7.25, RadixSort.Threshold * 2).ToArray();
        RadixSort.Sort(values, values.Length);
        Assert.All(values, v => Assert.Equal(-7.25, v));
    }
}
