using CellCheck.Core.Data;
using CellCheck.IO.Data;
using CellCheck.IO.Design;

namespace CellCheck.IO.Tests.Data;

public sealed class DataReaderTests
{
    private static LoadResult<DesignData> Read(TempDesign t)
    {
        var design = DesignReader.Read(t.DesignPath);
        Assert.True(design.Ok, string.Join("; ", design.Problems.Select(p => p.What)));
        return DataReader.Read(design.Value!);
    }

    [Fact]
    public void Columns_are_read_with_levels_in_natural_order_and_values_kept_exactly()
    {
        using var t = new TempDesign("a,b,y\n10,x,1.5\n9,y,2.5\n10,y,3.5\n");
        var d = Read(t).Value!;
        Assert.Equal(["9", "10"], d.Factors[0].Levels);
        Assert.Equal([1, 0, 1], d.Factors[0].Codes.ToArray());
        var y = d.Responses[0];
        Assert.Equal([1.5, 2.5, 3.5], y.Values.Select(v => v + y.Origin));
        Assert.Equal([2, 3, 4], d.SourceLines.ToArray());
    }

    [Fact]
    public void A_utf8_bom_and_quoted_fields_with_separators_are_read()
    {
        using var t = new TempDesign("a,b,y\n\"p,q\",x,1\n\"p,q\",\"x\",2\n", bom: true);
        var d = Read(t).Value!;
        Assert.Equal(["p,q"], d.Factors[0].Levels);
        Assert.Equal(["x"], d.Factors[1].Levels);
    }

    [Fact]
    public void Tab_separated_files_are_detected()
    {
        using var t = new TempDesign("a\tb\ty\n1\tx\t1\n2\tx\t2\n", "data: data.tsv\nfactors: [a, b]\nresponses: [y]\n", "data.tsv");
        Assert.Equal(2, Read(t).Value!.Factors[0].Levels.Count);
    }

    [Fact]
    public void Missing_and_non_numeric_values_are_excluded_with_line_and_reason()
    {
        using var t = new TempDesign("a,b,y\n1,x,NA\n1,x,\n1,x,abc\n1,x,Inf\n1,,5\n1,x,6\n");
        var d = Read(t).Value!;
        var excluded = d.Excluded[0];
        Assert.Equal([2, 3, 4, 5, 6], excluded.Select(e => e.Line));
        Assert.Equal(["missing", "missing", "not-a-number", "not-finite", "missing-factor"], excluded.Select(e => e.Code));
        Assert.Contains("'abc'", excluded[2].Reason, StringComparison.Ordinal);
        Assert.Contains("for b", excluded[4].Reason, StringComparison.Ordinal);
        Assert.Equal(1, d.Responses[0].Values.Count(double.IsFinite));
    }

    [Fact]
    public void Values_with_thirteen_constant_digits_are_stored_relative_to_an_exact_origin()
    {
        // NIST StRD SmLs09-style values: 1000000000000.4 is not representable in binary, but its offset from the
        // first value is exact when taken in decimal (exact decimal arithmetic, no source needed).
        using var t = new TempDesign("a,b,y\n1,x,1000000000000.4\n1,x,1000000000000.3\n1,x,1000000000000.5\n");
        var y = Read(t).Value!.Responses[0];
        Assert.Equal([0.0, -0.1, 0.1], y.Values);
    }

    [Fact]
    public void A_column_missing_from_the_header_is_located_in_the_design_file()
    {
        using var t = new TempDesign("a,B,y\n1,x,1\n");
        var p = Assert.Single(Read(t).Problems);
        Assert.Equal((ProblemCodes.MissingColumn, t.DesignPath, 2, 14), (p.Code, p.File, p.Line, p.Column));
        Assert.Contains("'B'", p.Fix, StringComparison.Ordinal);
    }

    [Fact]
    public void A_ragged_row_is_located_by_line()
    {
        using var t = new TempDesign("a,b,y\n1,x,1\n1,x\n");
        var p = Assert.Single(Read(t).Problems);
        Assert.Equal((ProblemCodes.RaggedRow, 3), (p.Code, p.Line));
    }

    [Theory]
    [InlineData("", ProblemCodes.DataEmpty)]
    [InlineData("a,b,y\n", ProblemCodes.DataNoRows)]
    [InlineData("a,a,b,y\n1,1,x,1\n", ProblemCodes.DuplicateColumn)]
    public void Empty_header_only_and_duplicate_header_files_are_problems(string data, string code)
    {
        using var t = new TempDesign(data);
        Assert.Equal(code, Assert.Single(Read(t).Problems).Code);
    }

    [Fact]
    public void A_missing_data_file_is_located_at_the_data_key()
    {
        using var t = new TempDesign("a,b,y\n", "factors: [a]\ndata: nothere.csv\nresponses: [y]\n");
        var p = Assert.Single(Read(t).Problems);
        Assert.Equal((ProblemCodes.DataNotFound, 2, 7), (p.Code, p.Line, p.Column));
    }

    [Fact]
    public void Run_order_reads_numbers_and_timestamps_and_file_order()
    {
        using var t = new TempDesign("a,b,y,t\n1,x,1,2026-03-01T08:00:00Z\n1,x,2,2026-03-01T08:30:00Z\n1,x,3,\n",
            "data: data.csv\nfactors: [a, b]\nresponses: [y]\nrun_order: t\n");
        var d = Read(t).Value!;
        Assert.Equal(1800.0, d.RunOrder![1] - d.RunOrder[0]);
        Assert.True(double.IsNaN(d.RunOrder[2]));
        using var f = new TempDesign("a,b,y\n1,x,1\n1,x,2\n", "data: data.csv\nfactors: [a, b]\nresponses: [y]\nrun_order: file\n");
        Assert.Equal([2.0, 3.0], Read(f).Value!.RunOrder!.ToArray());
    }

    [Fact]
    public void A_run_order_that_is_not_a_number_or_time_is_located()
    {
        using var t = new TempDesign("a,b,y,t\n1,x,1,1\n1,x,2,second\n", "data: data.csv\nfactors: [a, b]\nresponses: [y]\nrun_order: t\n");
        var p = Assert.Single(Read(t).Problems);
        Assert.Equal((ProblemCodes.BadRunOrder, 3, "t"), (p.Code, p.Line, p.ColumnName));
    }

    [Fact]
    public void The_same_run_position_in_two_blocks_is_a_located_problem_but_ties_within_a_block_are_not()
    {
        var design = "data: data.csv\nfactors: [a]\nblocks: [b]\nresponses: [y]\nrun_order: t\n";
        using var ok = new TempDesign("a,b,y,t\n1,x,1,1\n2,x,2,1\n1,z,3,2\n", design);
        Assert.True(Read(ok).Ok);
        using var bad = new TempDesign("a,b,y,t\n1,x,1,1\n2,z,2,1\n", design);
        var p = Assert.Single(Read(bad).Problems);
        Assert.Equal((ProblemCodes.DuplicateRun, 3), (p.Code, p.Line));
    }

    [Fact]
    public void A_factor_declared_numeric_with_a_text_level_is_located_in_the_design()
    {
        using var t = new TempDesign("a,b,y\n1,x,1\nhot,x,2\n", "data: data.csv\nfactors:\n  - column: a\n    kind: numeric\n  - b\nresponses: [y]\n");
        var p = Assert.Single(Read(t).Problems);
        Assert.Equal((ProblemCodes.NonNumericLevel, 3), (p.Code, p.Line));
        Assert.Contains("'hot'", p.What, StringComparison.Ordinal);
    }
}
