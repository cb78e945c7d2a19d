using System.Text;
using System.Text.Json;
using CellCheck.IO.Reports;

namespace CellCheck.IO.Tests.Reports;

public sealed class ReportWriterTests
{
    private static CheckRunResult Run(TempDesign t)
    {
        var run = CheckRun.Run(t.DesignPath);
        Assert.True(run.Ok, string.Join("; ", run.Problems.Select(p => p.What)));
        return run.Value!;
    }

    [Fact]
    public void Labels_that_look_like_markup_are_printed_as_text()
    {
        using var t = new TempDesign("a,b,y\n[red]x[/],q,1\n[red]x[/],q,2\n[red]x[/],q,4\n[bold],q,3\n[bold],q,5\n[bold],q,9\n");
        using var writer = new StringWriter();
        TerminalReportWriter.Write(Run(t).Report, writer, "0.0.0");
        Assert.Contains("[red]x[/]", writer.ToString(), StringComparison.Ordinal);
        Assert.Contains("[bold]", writer.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Terminal_lines_fit_one_hundred_columns_and_carry_no_trailing_spaces()
    {
        using var t = new TempDesign("a,b,y\n1,q,1\n1,q,2\n1,q,4\n2,q,3\n2,q,5\n2,q,9\n");
        using var writer = new StringWriter();
        TerminalReportWriter.Write(Run(t).Report, writer, "0.0.0");
        Assert.All(writer.ToString().Split('\n'), line =>
        {
            Assert.True(line.Length <= 100, line);
            Assert.Equal(line.TrimEnd(), line);
        });
    }

    [Fact]
    public void Numbers_that_do_not_exist_are_written_as_null_in_json()
    {
        using var t = new TempDesign("a,b,y\n1,q,1\n1,q,2\n2,q,5\n");
        using var stream = new MemoryStream();
        JsonReportWriter.Write(Run(t).Report, stream, "0.0.0");
        var text = Encoding.UTF8.GetString(stream.ToArray());
        Assert.DoesNotContain("NaN", text, StringComparison.Ordinal);
        using var doc = JsonDocument.Parse(text);
        var singleton = doc.RootElement.GetProperty("responses")[0].GetProperty("cells")[1];
        Assert.Equal(JsonValueKind.Null, singleton.GetProperty("sd").ValueKind);
        var sw = singleton.GetProperty("checks")[0];
        Assert.Equal("not-testable", sw.GetProperty("status").GetString());
        Assert.Equal("too-few-values", sw.GetProperty("reason").GetString());
        Assert.Equal(JsonValueKind.Null, sw.GetProperty("p").ValueKind);
    }

    [Fact]
    public void An_atomic_write_refuses_an_input_path_and_leaves_no_temporary_file()
    {
        using var t = new TempDesign("a,b,y\n1,q,1\n");
        var problem = AtomicFile.Write(t.DataPath, [t.DesignPath, t.DataPath], _ => throw new InvalidOperationException("must not be called"));
        Assert.Equal(ProblemCodes.OutputIsInput, problem!.Code);
        var target = Path.Combine(t.Folder, "deep", "er", "r.json");
        Assert.Null(AtomicFile.Write(target, [t.DataPath], s => s.WriteByte(42)));
        Assert.Equal([42], File.ReadAllBytes(target));
        Assert.Empty(Directory.GetFiles(t.Folder, "*.tmp", SearchOption.AllDirectories));
    }

    [Fact]
    public void A_failing_writer_leaves_the_previous_report_and_no_temporary_file()
    {
        using var t = new TempDesign("a,b,y\n1,q,1\n");
        var target = Path.Combine(t.Folder, "r.json");
        File.WriteAllText(target, "old");
        Assert.Throws<InvalidOperationException>(() => AtomicFile.Write(target, [], _ => throw new InvalidOperationException("interrupted")));
        Assert.Equal("old", File.ReadAllText(target));
    }
}
