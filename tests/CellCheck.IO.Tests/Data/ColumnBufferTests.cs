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

    [Fact]
    public void Two_buffers_in_one_reserved_array_join_into_that_array_when_they_fill_it()
    {
        var array = new int[10];
        var (first, second) = (new ColumnBuffer<int>(array, 0, 4), new ColumnBuffer<int>(array, 4, 6));
        for (var i = 0; i < 4; i++)
        {
            first.Add(i);
        }

        for (var i = 4; i < 10; i++)
        {
            second.Add(i);
        }

        first.Append(second);
        var values = first.Detach();
        Assert.Same(array, values);
        Assert.Equal(Enumerable.Range(0, 10), values);
    }

    [Fact]
    public void A_first_range_shorter_than_its_room_is_followed_directly_by_the_second_and_the_column_is_trimmed()
    {
        var array = new int[10];
        var (first, second) = (new ColumnBuffer<int>(array, 0, 5), new ColumnBuffer<int>(array, 5, 5));
        first.Add(0);
        first.Add(1);
        second.Add(2);
        second.Add(3);
        second.Last = 30;
        first.Append(second);
        first.Add(4); // past the joined values: a chunk of its own
        var values = first.Detach();
        Assert.NotSame(array, values);
        Assert.Equal([0, 1, 2, 30, 4], values);
    }

    [Fact]
    public void A_buffer_that_outgrows_its_reserved_room_goes_on_in_chunks()
    {
        var array = new int[3];
        var buffer = new ColumnBuffer<int>(array, 1, 2);
        for (var i = 0; i < 100_000; i++)
        {
            buffer.Add(i);
        }

        Assert.Equal(Enumerable.Range(0, 100_000), buffer.Detach());
        Assert.Equal([0, 0, 1], array);
    }
}
