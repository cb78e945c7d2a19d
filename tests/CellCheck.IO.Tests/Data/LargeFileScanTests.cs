using System.Text;
using CellCheck.IO.Data;
using CellCheck.IO.Design;

namespace CellCheck.IO.Tests.Data;

/// <summary>Files above the concurrent-scan size are still refused for an encoding fault, found on the second thread.</summary>
public sealed class LargeFileScanTests
{
    [Fact]
    public void A_Latin1_byte_near_the_end_of_a_large_file_is_a_located_encoding_problem()
    {
        var text = new StringBuilder("a,b,y\n");
        var line = 1;
        while (text.Length < DataReader.ConcurrentScanBytes + (1 << 20))
        {
            text.Append("1,x,").Append(line++ % 97).Append(".25\n");
        }

        using var t = new TempDesign(text.ToString());
        using (var stream = new FileStream(t.DataPath, FileMode.Append))
        {
            stream.Write([(byte)'2', (byte)',', 0xE9, (byte)',', (byte)'3', (byte)'\n']); // é in Latin-1
        }

        var design = DesignReader.Read(t.DesignPath).Value!;
        var result = DataReader.Read(design);
        Assert.False(result.Ok);
        Assert.Equal(result.Problems, DataReader.Read(design, splitBytes: 0).Problems);
        var problem = Assert.Single(result.Problems);
        Assert.Equal(line + 1, problem.Line);
        Assert.Contains("UTF-8", problem.What, StringComparison.Ordinal);
    }
}
