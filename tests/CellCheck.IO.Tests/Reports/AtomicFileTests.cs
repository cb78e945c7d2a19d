using CellCheck.IO.Reports;

namespace CellCheck.IO.Tests.Reports;

/// <summary>Reports never overwrite an input, however the path is written, and never exist half-written.</summary>
public sealed class AtomicFileTests
{
    [Fact]
    public void An_input_named_by_another_spelling_of_its_path_is_refused()
    {
        using var t = new TempDesign("a,b,y\n1,q,1\n");
        var dotted = Path.Combine(t.Folder, ".", "sub", "..", "data.csv");
        var problem = AtomicFile.Write(dotted, [t.DesignPath, t.DataPath], _ => throw new InvalidOperationException("must not be called"));
        Assert.Equal(ProblemCodes.OutputIsInput, problem!.Code);
    }

    [Fact]
    public void A_symbolic_link_to_the_data_file_or_into_its_folder_is_refused_and_the_data_are_unchanged()
    {
        using var t = new TempDesign("a,b,y\n1,q,1\n");
        var before = File.ReadAllBytes(t.DataPath);
        var fileLink = Path.Combine(t.Folder, "link.csv");
        File.CreateSymbolicLink(fileLink, t.DataPath);
        var folderLink = Path.Combine(t.Folder, "..", Path.GetFileName(t.Folder) + "-link");
        Directory.CreateSymbolicLink(folderLink, t.Folder);
        try
        {
            Assert.Equal(ProblemCodes.OutputIsInput, AtomicFile.Write(fileLink, [t.DataPath], s => s.WriteByte(1))!.Code);
            Assert.Equal(ProblemCodes.OutputIsInput, AtomicFile.Write(Path.Combine(folderLink, "data.csv"), [t.DataPath], s => s.WriteByte(1))!.Code);
            Assert.Equal(before, File.ReadAllBytes(t.DataPath));
        }
        finally
        {
            Directory.Delete(folderLink);
        }
    }

    [Fact]
    public void An_interrupted_write_keeps_the_previous_report_and_removes_its_temporary_file()
    {
        using var t = new TempDesign("a,b,y\n1,q,1\n");
        var target = Path.Combine(t.Folder, "out", "report.json");
        Assert.Null(AtomicFile.Write(target, [], s => s.Write("previous"u8)));
        Assert.Throws<InvalidOperationException>(() => AtomicFile.Write(target, [], s =>
        {
            s.Write("half a rep"u8);
            throw new InvalidOperationException("interrupted");
        }));
        Assert.Equal("previous", File.ReadAllText(target));
        Assert.Equal(["report.json"], Directory.GetFiles(Path.GetDirectoryName(target)!).Select(Path.GetFileName));
    }

    [Fact]
    public void A_folder_as_the_output_path_is_a_problem_not_an_exception()
    {
        using var t = new TempDesign("a,b,y\n1,q,1\n");
        Assert.Equal(ProblemCodes.OutputUnwritable, AtomicFile.Write(t.Folder, [t.DataPath], s => s.WriteByte(1))!.Code);
    }
}
