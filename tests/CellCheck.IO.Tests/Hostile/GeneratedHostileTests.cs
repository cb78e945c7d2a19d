using System.Text;
using CellCheck.IO.Data;
using CellCheck.IO.Design;

namespace CellCheck.IO.Tests.Hostile;

/// <summary>Hostile inputs too large or too machine-specific to keep as files: made in a temporary folder.</summary>
public sealed class GeneratedHostileTests
{
    [Fact]
    public void A_ten_megabyte_design_file_is_refused_as_too_large_without_being_parsed()
    {
        using var t = new TempDesign("a,b,y\n1,x,1\n");
        File.WriteAllText(t.DesignPath, "data: data.csv\nfactors: [a, b]\nresponses: [y]\nname: " + new string('x', 10 << 20) + "\n");
        var p = Assert.Single(DesignReader.Read(t.DesignPath).Problems);
        Assert.Equal(ProblemCodes.DesignTooLarge, p.Code);
    }

    [Fact]
    public void A_data_line_over_one_mebibyte_is_located()
    {
        using var t = new TempDesign("a,b,y\n1,x," + new string('9', CellCheck.IO.TextFiles.TextScan.MaxLineBytes) + "\n1,x,2\n");
        var p = Assert.Single(Read(t).Problems);
        Assert.Equal((ProblemCodes.LineTooLong, 2, (int?)null), (p.Code, p.Line, p.Column));
    }

    [Fact]
    public void A_long_but_allowed_value_is_excluded_as_not_a_number_with_its_line()
    {
        using var t = new TempDesign("a,b,y\n1,x," + new string('9', 100_000) + "\n1,x,2\n");
        var d = Read(t).Value!;
        var e = Assert.Single(d.Excluded[0]);
        Assert.Equal((2, "not-a-number"), (e.Line, e.Code));
        Assert.True(e.Reason.Length < 100, "the value is clipped in the reason");
    }

    [Fact]
    public void A_folder_given_as_the_design_or_the_data_is_a_located_problem()
    {
        using var t = new TempDesign("a,b,y\n1,x,1\n");
        Assert.Equal(ProblemCodes.DesignUnreadable, Assert.Single(DesignReader.Read(t.Folder).Problems).Code);
        File.Delete(t.DataPath);
        Directory.CreateDirectory(t.DataPath);
        var p = Assert.Single(Read(t).Problems);
        Assert.Equal((ProblemCodes.DataUnreadable, t.DesignPath, 1, 7), (p.Code, p.File, p.Line, p.Column));
    }

    [Fact]
    public void Missing_design_and_data_files_are_located_problems()
    {
        using var t = new TempDesign("a,b,y\n1,x,1\n");
        Assert.Equal(ProblemCodes.DesignNotFound, Assert.Single(DesignReader.Read(Path.Combine(t.Folder, "nope.yaml")).Problems).Code);
        File.Delete(t.DataPath);
        Assert.Equal(ProblemCodes.DataNotFound, Assert.Single(Read(t).Problems).Code);
    }

    [Fact]
    public void One_hundred_aliases_are_allowed_and_the_hundred_and_first_is_located()
    {
        var list = (int n) => "data: &d data.csv\nfactors: [a, b]\nresponses: [y]\nname: [" + string.Join(", ", Enumerable.Repeat("*d", n)) + "]\n";
        Assert.Equal(ProblemCodes.WrongType, DesignReader.Parse(list(100), "d.yaml").Problems[0].Code);
        var p = DesignReader.Parse(list(101), "d.yaml").Problems[0];
        Assert.Equal((ProblemCodes.AliasLimit, 4, 8 + (100 * 4)), (p.Code, p.Line, p.Column));
    }

    [Fact]
    public void Nesting_sixty_four_deep_is_read_and_sixty_five_is_refused()
    {
        string Nested(int depth) => "data: data.csv\nfactors: [a, b]\nresponses: [y]\nname: " + new string('[', depth - 1) + new string(']', depth - 1) + "\n";
        Assert.NotEqual(ProblemCodes.TooDeep, DesignReader.Parse(Nested(64), "d.yaml").Problems[0].Code);
        Assert.Equal(ProblemCodes.TooDeep, DesignReader.Parse(Nested(65), "d.yaml").Problems[0].Code);
    }

    [Fact]
    public void Ten_thousand_levels_in_one_factor_are_read_and_checked()
    {
        var data = new StringBuilder("a,b,y\n");
        for (var i = 0; i < 10_000; i++)
        {
            data.Append("L").Append(i).Append(",x,").Append(i % 7).Append(".5\n").Append("L").Append(i).Append(",x,").Append(i % 5).Append(".25\n");
        }

        using var t = new TempDesign(data.ToString());
        var run = CheckRun.Run(t.DesignPath);
        Assert.True(run.Ok);
        var r = Assert.Single(run.Value!.Report.Responses);
        Assert.Equal(10_000, r.Census.Cells);
        ReportInvariants.Check(run.Value.Report);
    }

    private static LoadResult<Core.Data.DesignData> Read(TempDesign t)
    {
        var design = DesignReader.Read(t.DesignPath);
        Assert.True(design.Ok);
        return DataReader.Read(design.Value!);
    }
}
