namespace CellCheck.Cli.Tests;

/// <summary>Hostile files through the command line: a located message and exit code 2, never a stack trace or exit 3.</summary>
public sealed class HostileInputCliTests : IDisposable
{
    private static readonly string Hostile = Path.Combine(CliRunner.RepoRoot, "tests", "CellCheck.IO.Tests", "Fixtures", "hostile");

    private readonly string _folder = Path.Combine(Path.GetTempPath(), "cellcheck-cli-hostile-" + Guid.NewGuid().ToString("N"));

    public HostileInputCliTests() => Directory.CreateDirectory(_folder);

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    [Theory]
    [InlineData("data/latin1-accents.csv", "data.encoding", ":2:6")]
    [InlineData("data/binary-zip.csv", "data.not-text", ":1:6")]
    [InlineData("data/empty.csv", "data.empty", ":1")]
    [InlineData("data/header-only.csv", "data.no-rows", ":2")]
    [InlineData("data/ragged-short.csv", "data.ragged-row", ":3")]
    [InlineData("data/duplicate-columns.csv", "data.duplicate-column", ":1")]
    [InlineData("data/unclosed-quote.csv", "data.unclosed-quote", ":3")]
    [InlineData("data/utf16-bom.csv", "data.encoding", ":1:1")]
    [InlineData("data/garbage.xlsx", "data.unreadable", "data.xlsx")]
    public void A_hostile_data_file_exits_with_two_and_a_located_message(string file, string code, string location)
    {
        var data = Path.Combine(_folder, "data" + Path.GetExtension(file));
        File.Copy(Path.Combine(Hostile, file), data);
        var design = Path.Combine(_folder, "design.yaml");
        File.WriteAllText(design, $"data: {Path.GetFileName(data)}\nfactors: [a, b]\nresponses: [y]\n");
        Expect(CliRunner.Run("check", design), code, location);
    }

    [Theory]
    [InlineData("design/latin1.yaml", "design.encoding", ":4:10")]
    [InlineData("design/tab-indent.yaml", "design.yaml-syntax", ":3:1")]
    [InlineData("design/alias-bomb.yaml", "design.alias-limit", ":8:45")]
    [InlineData("design/deep-nesting.yaml", "design.too-deep", ":4:70")]
    [InlineData("design/two-documents.yaml", "design.multiple-documents", ":4:1")]
    [InlineData("design/duplicate-key.yaml", "design.duplicate-key", ":4:1")]
    [InlineData("design/binary.yaml", "design.not-text", ":2:1")]
    public void A_hostile_design_file_exits_with_two_and_a_located_message(string file, string code, string location)
    {
        var design = Path.Combine(_folder, "design.yaml");
        File.Copy(Path.Combine(Hostile, file), design);
        File.WriteAllText(Path.Combine(_folder, "data.csv"), "a,b,y\n1,x,1\n1,x,2\n2,y,3\n2,y,5\n");
        Expect(CliRunner.Run("check", design), code, location);
    }

    [Theory]
    [InlineData("data/latin1-accents.csv", "data.encoding")]
    [InlineData("data/ragged-short.csv", "data.ragged-row")]
    [InlineData("data/unclosed-quote.csv", "data.unclosed-quote")]
    public void Init_on_a_hostile_data_file_exits_with_two_and_writes_nothing(string file, string code)
    {
        var data = Path.Combine(_folder, "data.csv");
        File.Copy(Path.Combine(Hostile, file), data);
        Expect(CliRunner.Run("init", data), code, "data.csv");
        Assert.False(File.Exists(Path.Combine(_folder, "data.yaml")));
    }

    [Fact]
    public void Thousands_of_problems_are_cut_to_a_readable_list_with_a_count()
    {
        var design = Path.Combine(_folder, "design.yaml");
        File.WriteAllText(design, "data: data.csv\nfactors: [a]\nresponses: [y]\n" + string.Concat(Enumerable.Range(0, 3000).Select(i => $"k{i}: 1\n")));
        var (code, _, err) = CliRunner.Run("check", design);
        Assert.Equal(2, code);
        Assert.Equal(ProblemPrinter.Shown, err.Split('\n').Count(l => l.StartsWith("error [", StringComparison.Ordinal)));
        Assert.Contains($"and {3000 - ProblemPrinter.Shown} more problems not shown", err, StringComparison.Ordinal);
    }

    [Fact]
    public void Out_creates_nested_folders_and_leaves_no_temporary_files()
    {
        var target = Path.Combine(_folder, "a", "b", "c");
        var (code, _, err) = CliRunner.Run("check", CliRunner.Design("coating-cure.yaml"), "--out", target, "--quiet");
        Assert.True(code is 0 or 1, err);
        Assert.True(File.Exists(Path.Combine(target, "report.json")));
        Assert.True(File.Exists(Path.Combine(target, "diagnostics.csv")));
        Assert.Empty(Directory.GetFiles(target, "*.tmp"));
    }

    [Fact]
    public void A_report_aimed_at_the_data_file_by_another_spelling_is_refused_and_the_data_are_unchanged()
    {
        var data = Path.Combine(_folder, "data.csv");
        File.WriteAllText(data, "a,b,y\n1,x,1\n1,x,2\n2,y,3\n2,y,5\n");
        var design = Path.Combine(_folder, "design.yaml");
        File.WriteAllText(design, "data: data.csv\nfactors: [a, b]\nresponses: [y]\n");
        var before = File.ReadAllBytes(data);
        var (code, _, err) = CliRunner.Run("check", design, "--json", Path.Combine(_folder, "x", "..", "data.csv"));
        Assert.Equal(2, code);
        Assert.Contains("error [output.is-input]", err, StringComparison.Ordinal);
        Assert.Equal(before, File.ReadAllBytes(data));
    }

    private static void Expect((int Code, string Out, string Err) run, string code, string location)
    {
        Assert.Equal(2, run.Code);
        Assert.DoesNotContain("internal error", run.Err, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", run.Err, StringComparison.Ordinal);
        var first = run.Err.Split('\n')[0];
        Assert.StartsWith($"error [{code}] ", first, StringComparison.Ordinal);
        Assert.Contains(location, first, StringComparison.Ordinal);
    }
}
