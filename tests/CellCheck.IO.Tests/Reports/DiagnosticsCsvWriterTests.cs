using CellCheck.Core.Analysis;
using System.Text;
using CellCheck.IO.Reports;

namespace CellCheck.IO.Tests.Reports;

public sealed class DiagnosticsCsvWriterTests
{
    /// <summary>Two responses, a label that needs quoting, a singleton cell (leverage one: empty studentized values).</summary>
    private const string Data = "a,b,y,z\n\"x,1\",q,1,10\n\"x,1\",q,2,12\n\"x,1\",q,4,11\n2,q,3,9\n2,q,5,14\n2,q,9,13\n3,r,7,8\n2,r,6,7\n2,r,2,5\n";

    private static byte[] Csv(CheckReport report, int chunkRows)
    {
        using var stream = new MemoryStream();
        DiagnosticsCsvWriter.Write(report, stream, chunkRows);
        return stream.ToArray();
    }

    [Fact]
    public void Chunks_written_side_by_side_make_the_same_file_as_one_pass_over_every_row()
    {
        using var t = new TempDesign(Data, "data: data.csv\nfactors: [a, b]\nresponses: [y, z]\n");
        var run = CheckRun.Run(t.DesignPath);
        Assert.True(run.Ok, string.Join("; ", run.Problems.Select(p => p.What)));
        var whole = Csv(run.Value!.Report, int.MaxValue);
        var lines = Encoding.UTF8.GetString(whole).Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(1 + 9 + 9, lines.Length); // header, then every row of both responses
        Assert.StartsWith("response,line,a,b,fitted,", lines[0], StringComparison.Ordinal);
        Assert.Contains(lines, l => l.StartsWith("y,", StringComparison.Ordinal) && l.Contains("\"x,1\"", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.StartsWith("z,", StringComparison.Ordinal) && l.EndsWith(",,,1,", StringComparison.Ordinal)); // the singleton
        foreach (var rows in new[] { 1, 2, 3, 4, 8, 9, 10, 17, 18, 19 })
        {
            Assert.Equal(whole, Csv(run.Value.Report, rows));
        }
    }
}
