using System.Globalization;
using System.Text;
using CellCheck.Core.Data;
using CellCheck.IO.Data;
using CellCheck.IO.Design;
using CellCheck.IO.Tests.Hostile;

namespace CellCheck.IO.Tests.Data;

/// <summary>A delimited file read in ranges on several threads gives the data the one-thread reader gives, bit for bit,
/// however many ranges and threads (every read below is compared with the one-thread read in 2 to 9 ranges on 2 to 4 threads).</summary>
public sealed class SplitReaderTests
{
    private const string TwoFactors = "data: data.csv\nfactors: [a, b]\nresponses: [y]\n";

    [Fact]
    public void The_demo_data_files_read_in_ranges_as_in_one()
    {
        var root = new DirectoryInfo(AppContext.BaseDirectory);
        while (!File.Exists(Path.Combine(root.FullName, "CellCheck.sln")))
        {
            root = root.Parent!;
        }

        var designs = Directory.GetFiles(Path.Combine(root.FullName, "designs"), "*.yaml");
        Assert.NotEmpty(designs);
        foreach (var path in designs)
        {
            Assert.True(Same(path).Ok, path);
        }
    }

    [Fact]
    public void Levels_that_first_appear_in_later_ranges_follow_those_of_earlier_ones()
    {
        var text = Rows(400, i => $"{(i < 200 ? "L" + (i % 5) : "L" + (i % 37))},{(i < 200 ? i % 3 : (i % 11) * 0.5).ToString(CultureInfo.InvariantCulture)},B{i % (i < 200 ? 2 : 9)},{i % 13}.{i % 7}", "a,b,c,y");
        using var t = new TempDesign(text, "data: data.csv\nfactors: [a, {column: b, kind: numeric}]\nblocks: [c]\nresponses: [y]\n");
        var d = Same(t).Value!;
        Assert.Equal(37, d.Factors[0].Levels.Count);
        Assert.Equal(9, d.Blocks[0].Levels.Count);
    }

    [Fact]
    public void Missing_values_non_numbers_and_responses_whose_first_values_are_missing_read_alike()
    {
        string[] y = ["NA", "", "abc", "Inf", "1e400", "12.5", "-3.25", "1234567890123.4567", "7", "-", "0.000125"];
        var text = Rows(300, i => string.Join(',',
            i % 17 == 3 ? "" : "a" + (i % 4), i % 23 == 5 ? "NA" : "b" + (i % 3),
            y[i % y.Length],
            i < 160 ? "NA" : (i * 0.25).ToString(CultureInfo.InvariantCulture),
            i < 10 ? "" : (1000 + (i % 9)).ToString(CultureInfo.InvariantCulture) + "." + (i % 1000).ToString("000", CultureInfo.InvariantCulture),
            i == 2 ? "1.5e3" : (i % 19).ToString(CultureInfo.InvariantCulture) + ".5",
            i == 1 ? "12345678901234567890.5" : "12345678901234567" + (i % 10).ToString(CultureInfo.InvariantCulture) + ".25"), "a,b,y,z,w,v,u");
        using var t = new TempDesign(text, "data: data.csv\nfactors: [a, b]\nresponses: [y, z, w, v, u]\nmissing: [NA, \"-\"]\n");
        var d = Same(t).Value!;
        Assert.Null(d.Responses[3].Decimals);
        Assert.NotEqual(0, d.Responses[1].Origin);
    }

    [Theory]
    [InlineData("run_order: run\nwhere: {b: [x, y]}\n")]
    [InlineData("run_order: file\n")]
    public void A_where_filter_and_the_run_order_read_alike(string extra)
    {
        var text = Rows(500, i => $"a{i % 3},{(i % 5) switch { 0 => "q", 1 or 2 => "x", _ => "y" }},{i % 11}.{i % 3},{1000 - i}", "a,b,y,run");
        using var t = new TempDesign(text, TwoFactors + extra);
        var d = Same(t).Value!;
        Assert.NotNull(d.RunOrder);
    }

    [Theory]
    [InlineData(-1, true)]
    [InlineData(3, false)]
    [InlineData(250, false)]
    [InlineData(251, false)]
    [InlineData(498, false)]
    public void Runs_numbered_one_a_row_are_counted_across_ranges_until_a_number_breaks_the_count(int broken, bool consecutive)
    {
        // rows numbered 101, 102, ...; the row at index broken (none when −1) repeats the number before it
        var text = Rows(500, i => $"a{i % 3},b{i % 2},{i % 11}.{i % 3},{(i == broken ? 100 + i : 101 + i).ToString(CultureInfo.InvariantCulture)}", "a,b,y,run");
        using var t = new TempDesign(text, TwoFactors + "run_order: run\n");
        var order = Same(t).Value!.RunOrder!;
        Assert.Equal(consecutive, order.IsConsecutive);
        Assert.Equal(Enumerable.Range(0, 500).Select(i => i == broken ? 100.0 + i : 101.0 + i), order.ToArray());
    }

    [Fact]
    public void The_file_order_as_run_order_is_the_line_numbers_counted()
    {
        using var t = new TempDesign(Rows(300, i => $"a{i % 3},b{i % 2},{i % 7}"), TwoFactors + "run_order: file\n");
        var order = Same(t).Value!.RunOrder!;
        Assert.True(order.IsConsecutive);
        Assert.Equal(Enumerable.Range(2, 300).Select(l => (double)l), order.ToArray());
    }

    [Theory]
    [InlineData("\r\n", true)]
    [InlineData("\n\n", true)]
    [InlineData("\r", false)]
    [InlineData("mixed", true)]
    public void Line_endings_and_blank_lines_keep_the_lines_of_the_file(string ending, bool split)
    {
        string[] mixed = ["\n", "\r\n", "\r", "\r\r\n", "\n\r\n", "\r \r\n"];
        var text = new StringBuilder("a,b,y").Append(ending == "mixed" ? "\r\n" : ending);
        for (var i = 0; i < 300; i++)
        {
            text.Append('a').Append(i % 4).Append(",b").Append(i % 3).Append(',').Append(i % 10).Append(".5");
            text.Append(ending == "mixed" ? mixed[i % mixed.Length] : ending).Append(i is > 140 and < 160 ? ending == "\r" ? "\r" : "\n" : "");
        }

        using var t = new TempDesign(text.ToString());
        Assert.Equal(300, Same(t, split).Value!.RowCount);
    }

    [Fact]
    public void A_header_ended_by_a_lone_cr_before_a_second_range_that_starts_with_a_blank_line_keeps_the_lines()
    {
        var text = new StringBuilder("a,b,y\r");
        for (var i = 0; i < 100; i++)
        {
            text.Append("a1,b").Append(i % 2).Append(',').Append(i).Append(i is >= 40 and < 60 ? "\n\n\n\n" : "\n");
        }

        using var t = new TempDesign(text.ToString());
        Assert.Equal('\n', text[(int)SplitPlan.Find(t.DataPath, 0)!.Starts[1]]);
        Same(t);
    }

    [Theory]
    [InlineData(250)]
    [InlineData(60)]
    public void The_first_ragged_row_is_the_problem_reported(int raggedInFirstHalf)
    {
        var text = Rows(300, i => i == 260 || i == raggedInFirstHalf ? "a1,b2" : $"a{i % 3},b{i % 2},{i}.5");
        using var t = new TempDesign(text, TwoFactors);
        var p = Assert.Single(Same(t).Problems);
        Assert.Equal(Math.Min(260, raggedInFirstHalf) + 2, p.Line);
    }

    [Fact]
    public void Responses_whose_first_values_lie_in_later_ranges_are_stored_from_the_first_value_in_file_order()
    {
        // y is missing in the first five sixths of the rows, z in the first third; w has a value only near the end
        var text = Rows(600, i => string.Join(',', "a" + (i % 4), "b" + (i % 3),
            i < 500 ? "NA" : "1000" + (i % 7).ToString(CultureInfo.InvariantCulture) + "." + (i % 13).ToString(CultureInfo.InvariantCulture),
            i < 200 ? "" : (2.5 + (i % 11)).ToString(CultureInfo.InvariantCulture),
            i == 590 ? "123456789.125" : "NA"), "a,b,y,z,w");
        using var t = new TempDesign(text, "data: data.csv\nfactors: [a, b]\nresponses: [y, z, w]\nmissing: [NA]\n");
        var d = Same(t).Value!;
        Assert.Equal(10003.6, d.Responses[0].Origin); // row 500: 1000, 500 mod 7, ".", 500 mod 13
        Assert.Equal(123456789.125, d.Responses[2].Origin);
    }

    [Fact]
    public void Cuts_fall_at_line_starts_and_number_the_lines_of_the_file()
    {
        string[] endings = ["\n", "\r\n", "\r\r\n", "\n\n"];
        var text = new StringBuilder("a,b,y\r\n");
        for (var i = 0; i < 400; i++)
        {
            text.Append('a').Append(i % 4).Append(",b,").Append(new string('7', 1 + (i % 9))).Append(endings[i / 7 % endings.Length]);
        }

        text.Append("a1,b,5"); // a last line without a break
        using var t = new TempDesign(text.ToString());
        var bytes = File.ReadAllBytes(t.DataPath);
        for (var parts = 2; parts <= 12; parts++)
        {
            var plan = SplitPlan.Find(t.DataPath, 0, parts)!;
            Assert.Equal(parts, plan.Count);
            Assert.Equal(2, plan.FirstLines[0]);
            for (var r = 1; r < plan.Count; r++)
            {
                Assert.True(plan.Starts[r] > plan.Starts[r - 1]);
                Assert.Equal((byte)'\n', bytes[plan.Starts[r] - 1]);
                Assert.Equal(1 + Breaks(bytes.AsSpan(0, (int)plan.Starts[r])), plan.FirstLines[r]);
                Assert.Equal(plan.FirstLines[r] - plan.FirstLines[r - 1], plan.Lines[r - 1]);
            }

            Assert.Equal(Breaks(bytes), plan.Lines.Sum()); // every line but the header, and the last one, which has no break
        }

        Assert.Equal(3, SplitPlan.Find(t.DataPath, 0, 3)!.Count);
    }

    [Fact]
    public void A_file_of_few_long_lines_is_cut_in_fewer_ranges_than_asked()
    {
        var text = Rows(3, i => $"a{i},b,{new string('1', 2000)}");
        using var t = new TempDesign(text);
        var plan = SplitPlan.Find(t.DataPath, 0, 8)!;
        Assert.Equal(3, plan.Count); // one line a range: the header's range holds the first row
        Same(t);
    }

    /// <summary>Line breaks as the reader counts them: CR LF, a lone CR or a lone LF each end a line.</summary>
    private static int Breaks(ReadOnlySpan<byte> bytes)
    {
        var count = 0;
        for (var i = 0; i < bytes.Length; i++)
        {
            count += bytes[i] == '\n' || (bytes[i] == '\r' && (i + 1 == bytes.Length || bytes[i + 1] != '\n')) ? 1 : 0;
        }

        return count;
    }

    [Fact]
    public void An_undeclared_thousands_separator_in_the_second_half_reads_alike()
    {
        var text = Rows(200, i => $"a{i % 3};x;{(i == 150 ? "1.234,5" : i + ",5")}", "a;b;y");
        using var t = new TempDesign(text, "data: data.csv\ndelimiter: \";\"\ndecimal: \",\"\nfactors: [a, b]\nresponses: [y]\n");
        Assert.Equal(152, Assert.Single(Same(t).Problems).Line);
    }

    [Fact]
    public void A_file_with_a_quote_is_read_by_the_one_thread_reader()
    {
        var text = Rows(100, i => i == 80 ? "\"a,1\",b1,2" : $"a{i % 3},b1,{i}");
        using var t = new TempDesign(text, TwoFactors);
        Assert.True(Same(t, split: false).Ok);
    }

    [Fact]
    public void Files_of_every_small_size_read_alike_wherever_the_cut_falls()
    {
        for (var n = 1; n <= 30; n++)
        {
            var text = Rows(n, i => $"a{i % 3},{new string('b', 1 + (i * 7 % 5))},{(i % 4 == 1 ? "NA" : i.ToString(CultureInfo.InvariantCulture))}");
            using var t = new TempDesign(text, TwoFactors);
            Same(t, split: n > 1);
        }
    }

    [Fact]
    public void Every_hostile_delimited_data_file_reads_alike()
    {
        var root = Path.Combine(AppContext.BaseDirectory, "Fixtures", "hostile");
        foreach (var line in File.ReadLines(Path.Combine(root, "cases.tsv")))
        {
            var fields = line.Split('\t');
            if (line.StartsWith('#') || fields.Length < 2 || fields[1] == "-" || !TableOpener.IsText(fields[0]))
            {
                continue;
            }

            using var setup = new HostileSetup(Path.Combine(root, fields[0]), fields[1]);
            Same(setup.DesignPath);
        }
    }

    private static string Rows(int count, Func<int, string> row, string header = "a,b,y")
    {
        var text = new StringBuilder(header).Append('\n');
        for (var i = 0; i < count; i++)
        {
            text.Append(row(i)).Append('\n');
        }

        return text.ToString();
    }

    private static LoadResult<DesignData> Same(TempDesign t, bool split = true)
    {
        Assert.Equal(split, SplitPlan.Find(t.DataPath, 0) is not null);
        return Same(t.DesignPath);
    }

    /// <summary>Ranges and threads of the split reads compared with the one-thread read.</summary>
    private static readonly (int Ranges, int Threads)[] Splits = [(2, 2), (3, 2), (4, 2), (5, 4), (9, 3)];

    /// <summary>Reads the design's data with one thread and in ranges on several; asserts they agree and returns the result.</summary>
    private static LoadResult<DesignData> Same(string designPath)
    {
        var design = DesignReader.Read(designPath);
        Assert.True(design.Ok, designPath);
        var one = DataReader.Read(design.Value!, long.MaxValue);
        foreach (var (ranges, threads) in Splits)
        {
            SameData.Assert(one, DataReader.Read(design.Value!, 0, threads, ranges));
        }

        return one;
    }
}
