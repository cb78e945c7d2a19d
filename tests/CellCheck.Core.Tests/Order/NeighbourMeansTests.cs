using CellCheck.Core.Order;

namespace CellCheck.Core.Tests.Order;

/// <summary>
/// The neighbouring cells' mean sums behind the blocked Durbin-Watson moments, summed with the cells shared out over
/// threads, against one plain loop in run order (exact: each sum takes its terms in the same order, so the doubles are
/// compared bit for bit; common practice, no source).
/// </summary>
public sealed class NeighbourMeansTests
{
    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(5)]
    public void Sums_over_ranges_of_cells_equal_one_plain_loop_bit_for_bit(int parts)
    {
        const int n = 7000, cells = 37, p = 5;
        var random = new Random(11);
        var cell = new int[n];
        for (var t = 0; t < n; t++)
        {
            cell[t] = t % 50 < 10 ? 3 : random.Next(cells); // runs of one cell as well as scattered ones
        }

        var mean = new double[cells * p];
        for (var i = 0; i < mean.Length; i++)
        {
            mean[i] = random.NextDouble() / (1 + random.Next(7));
        }

        var (back1, back2, ahead1) = NeighbourMeans.Sum(cell, cells, mean, p, parts);

        var (e1, e2, a1) = (new double[cells * p], new double[cells * p], new double[cells * p]);
        for (var t = 0; t < n; t++)
        {
            for (var a = 0; a < p; a++)
            {
                var at = (cell[t] * p) + a;
                if (t > 0)
                {
                    e1[at] += mean[(cell[t - 1] * p) + a];
                }

                if (t > 1)
                {
                    e2[at] += mean[(cell[t - 2] * p) + a];
                }

                if (t < n - 1)
                {
                    a1[at] += mean[(cell[t + 1] * p) + a];
                }
            }
        }

        Assert.Equal(e1, back1);
        Assert.Equal(e2, back2);
        Assert.Equal(a1, ahead1);
    }
}
