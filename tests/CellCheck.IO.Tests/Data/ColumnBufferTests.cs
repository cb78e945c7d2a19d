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
}
