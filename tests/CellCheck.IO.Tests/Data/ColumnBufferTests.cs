using CellCheck.IO.Data;

namespace CellCheck.IO.Tests.Data;

public sealed class ColumnBufferTests
{
    [Fact]
    public void Values_come_back_in_order_across_chunk_boundaries_and_the_last_can_be_replaced()
    {
        var buffer = new ColumnBuffer<int>();
        for (var i = 0; i < 200_000; i++)
        {
            buffer.Add(i);
        }

        buffer.Last = -1;
        var values = buffer.Detach();
        Assert.Equal(200_000, values.Length);
        Assert.Equal(65_536, values[65_536]);
        Assert.Equal(-1, values[^1]);
        Assert.Equal(0, buffer.Count);
        Assert.Empty(buffer.ToArray());
    }

    [Fact]
    public void Appending_a_column_moves_its_values_after_these_and_empties_it()
    {
        var (first, next) = (new ColumnBuffer<int>(), new ColumnBuffer<int>());
        for (var i = 0; i < 70_000; i++)
        {
            first.Add(i);
        }

        for (var i = 70_000; i < 200_000; i++)
        {
            next.Add(i);
        }

        first.Append(next);
        first.Append(new ColumnBuffer<int>());
        first.Add(200_000);
        Assert.Equal(0, next.Count);
        Assert.Equal(Enumerable.Range(0, 200_001), first.Detach());
    }
}
