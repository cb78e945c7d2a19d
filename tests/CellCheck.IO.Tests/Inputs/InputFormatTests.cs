using System.Text;
using System.Text.Json;
using CellCheck.IO.Reports;

namespace CellCheck.IO.Tests.Inputs;

/// <summary>The same data as CSV, as semicolon text with a decimal comma, and as XLSX must give identical reports.</summary>
public sealed class InputFormatTests
{
    private static string Responses(string designPath)
    {
        var run = CheckRun.Run(designPath);
        Assert.True(run.Ok, string.Join("; ", run.Problems.Select(p => p.Code + " " + p.What)));
        using var stream = new MemoryStream();
        JsonReportWriter.Write(run.Value!.Report, stream, "test");
        using var doc = JsonDocument.Parse(stream.ToArray());
        return doc.RootElement.GetProperty("responses").GetRawText();
    }

    private static string DemoCsv => Path.Combine(CliRoot(), "designs", "assay-lab.csv");

    private static string CliRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "CellCheck.sln")))
        {
            dir = dir.Parent;
        }

        return dir!.FullName;
    }

    [Fact]
    public void Csv_semicolon_decimal_comma_text_and_xlsx_give_identical_reports()
    {
        var rows = WorkbookFiles.ReadCsv(DemoCsv);
        const string Roles = "factors: [analyst, reagent_lot]\nresponses: [potency]\nrun_order: sequence\n";
        using var csv = new TempDesign(File.ReadAllText(DemoCsv), "data: data.csv\n" + Roles);
        var regional = string.Join("\n", rows.Select(r => string.Join(";", r.Select(c => c.Replace('.', ','))))) + "\n";
        using var text = new TempDesign(regional, "data: data.csv\ndelimiter: \";\"\ndecimal: \",\"\n" + Roles);
        using var xlsx = new TempDesign(string.Empty, "data: data.xlsx\nsheet: trial\n" + Roles, dataName: "unused.csv");
        WorkbookFiles.Write(Path.Combine(xlsx.Folder, "data.xlsx"), rows);

        var expected = Responses(csv.DesignPath);
        Assert.Equal(expected, Responses(text.DesignPath));
        Assert.Equal(expected, Responses(xlsx.DesignPath));
    }

    [Fact]
    public void A_sheet_may_be_named_by_position_and_the_header_row_given()
    {
        using var t = new TempDesign(string.Empty, "data: data.xlsx\nsheet: 1\nheader_row: 2\nfactors: [a]\nresponses: [y]\n", dataName: "unused.csv");
        WorkbookFiles.Write(Path.Combine(t.Folder, "data.xlsx"), [["Trial of 1 March", ""], ["a", "y"], ["p", "1.5"], ["p", "2.5"], ["q", "3"]]);
        var run = CheckRun.Run(t.DesignPath);
        Assert.True(run.Ok, string.Join("; ", run.Problems.Select(p => p.What)));
        Assert.Equal(3, run.Value!.Report.Responses[0].RowsUsed);
    }

    [Theory]
    [InlineData("sheet: nope\n", ProblemCodes.SheetNotFound)]
    [InlineData("sheet: 7\n", ProblemCodes.SheetNotFound)]
    [InlineData("header_row: 40\n", ProblemCodes.DataEmpty)]
    public void A_wrong_sheet_or_header_row_is_a_located_problem(string option, string code)
    {
        using var t = new TempDesign(string.Empty, "data: data.xlsx\n" + option + "factors: [a]\nresponses: [y]\n", dataName: "unused.csv");
        WorkbookFiles.Write(Path.Combine(t.Folder, "data.xlsx"), [["a", "y"], ["p", "1"]]);
        Assert.Equal(code, Assert.Single(CheckRun.Run(t.DesignPath).Problems).Code);
    }

    [Fact]
    public void A_merged_or_empty_header_cell_is_located_by_column_letter()
    {
        using var t = new TempDesign(string.Empty, "data: data.xlsx\nfactors: [a]\nresponses: [y]\n", dataName: "unused.csv");
        WorkbookFiles.Write(Path.Combine(t.Folder, "data.xlsx"), [["a", "", "y"], ["p", "x", "1"]]);
        var p = Assert.Single(CheckRun.Run(t.DesignPath).Problems);
        Assert.Equal(ProblemCodes.EmptyHeader, p.Code);
        Assert.Contains("cell B1", p.What, StringComparison.Ordinal);
    }

    [Fact]
    public void Text_in_a_numeric_column_of_a_sheet_is_excluded_with_its_cell()
    {
        using var t = new TempDesign(string.Empty, "data: data.xlsx\nfactors: [a]\nresponses: [y]\n", dataName: "unused.csv");
        WorkbookFiles.Write(Path.Combine(t.Folder, "data.xlsx"), [["a", "y"], ["p", "1"], ["p", "n.d."], ["q", "2"]]);
        var excluded = Assert.Single(CheckRun.Run(t.DesignPath).Value!.Report.Responses[0].Excluded);
        Assert.Equal((3, "not-a-number"), (excluded.Line, excluded.Code));
    }

    [Fact]
    public void An_empty_sheet_is_a_located_problem()
    {
        using var t = new TempDesign(string.Empty, "data: data.xlsx\nfactors: [a]\nresponses: [y]\n", dataName: "unused.csv");
        WorkbookFiles.Write(Path.Combine(t.Folder, "data.xlsx"), [["a", "y"]]);
        Assert.Equal(ProblemCodes.DataNoRows, Assert.Single(CheckRun.Run(t.DesignPath).Problems).Code);
    }

    [Fact]
    public void An_undeclared_thousands_separator_is_refused_and_a_declared_one_read()
    {
        using var bad = new TempDesign("a;y\np;1.234,5\np;2\nq;3\n", "data: data.csv\ndelimiter: \";\"\ndecimal: \",\"\nfactors: [a]\nresponses: [y]\n");
        var p = Assert.Single(CheckRun.Run(bad.DesignPath).Problems);
        Assert.Equal((ProblemCodes.ThousandsSeparator, 2), (p.Code, p.Line));
        using var good = new TempDesign("a;y\np;1.234,5\np;2\nq;3\n", "data: data.csv\ndelimiter: \";\"\ndecimal: \",\"\nthousands: \".\"\nfactors: [a]\nresponses: [y]\n");
        var run = CheckRun.Run(good.DesignPath);
        Assert.True(run.Ok);
        Assert.Equal((1234.5 + 2) / 2, run.Value!.Report.Responses[0].Cells[0].Mean, 1e-12); // cell p holds 1.234,5 and 2
    }

    [Fact]
    public void Declared_missing_tokens_exclude_rows_as_missing()
    {
        using var t = new TempDesign("a,y\np,1\np,-\np,3\n", "data: data.csv\nmissing: [NA, \"-\"]\nfactors: [a]\nresponses: [y]\n");
        var excluded = Assert.Single(CheckRun.Run(t.DesignPath).Value!.Report.Responses[0].Excluded);
        Assert.Equal((3, "missing"), (excluded.Line, excluded.Code));
    }

    [Fact]
    public void A_where_filter_keeps_matching_rows_and_counts_the_rest()
    {
        using var t = new TempDesign("site,a,y\nnorth,p,1\nsouth,p,2\nnorth,p,3\nwest,q,4\n", "data: data.csv\nwhere: { site: [north, west] }\nfactors: [a]\nresponses: [y]\n");
        var report = CheckRun.Run(t.DesignPath).Value!.Report;
        Assert.Equal(1, report.Design.FilteredOut);
        Assert.Equal(3, report.Responses[0].RowsUsed);
        using var none = new TempDesign("site,a,y\nnorth,p,1\n", "data: data.csv\nwhere: { site: east }\nfactors: [a]\nresponses: [y]\n");
        Assert.Equal(ProblemCodes.NoRowsLeft, Assert.Single(CheckRun.Run(none.DesignPath).Problems).Code);
    }

    [Fact]
    public void Adjusting_across_cells_and_responses_makes_one_holm_family()
    {
        var data = new StringBuilder("a,y,z\n");
        double[] y = [1, 2, 3, 9, 1, 2, 4, 5, 2, 3, 4, 12, 1, 5, 6, 7];
        for (var i = 0; i < 16; i++)
        {
            data.Append(i < 8 ? "p" : "q").Append(',').Append(y[i].ToString(System.Globalization.CultureInfo.InvariantCulture)).Append(',')
                .Append(y[15 - i].ToString(System.Globalization.CultureInfo.InvariantCulture)).Append('\n');
        }

        using var t = new TempDesign(data.ToString(), "data: data.csv\nadjust_across: cells-and-responses\nfactors: [a]\nresponses: [y, z]\n");
        var report = CheckRun.Run(t.DesignPath).Value!.Report;
        var sw = report.Responses.SelectMany(r => r.Cells.Select(c => c.Checks[0])).ToArray();
        var raw = sw.Select(c => c.P!.Value).ToArray();
        // Holm (1979) over 4 p-values: the smallest is multiplied by 4 (common practice, no source)
        var smallest = Array.IndexOf(raw, raw.Min());
        Assert.Equal(Math.Min(1, 4 * raw[smallest]), sw[smallest].PAdjusted!.Value, 1e-15);
        Assert.Equal("cells-and-responses", report.Design.AdjustAcross);
    }
}
