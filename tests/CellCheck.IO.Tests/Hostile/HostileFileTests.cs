namespace CellCheck.IO.Tests.Hostile;

/// <summary>
/// Every file in <c>Fixtures/hostile</c> (hand-made hostile inputs, and the fuzzer's crash reproducers in
/// <c>fuzz/</c>) is read without an exception and gives the problem code and location listed for it in
/// <c>cases.tsv</c>, or reads cleanly when listed <c>ok</c>.
/// </summary>
public sealed class HostileFileTests
{
    private static readonly string Root = Path.Combine(AppContext.BaseDirectory, "Fixtures", "hostile");

    public static TheoryData<HostileCase> Cases() => new(HostileCase.Load(Path.Combine(Root, "cases.tsv")));

    [Theory]
    [MemberData(nameof(Cases))]
    public void A_hostile_file_gives_its_listed_problem_and_location_and_never_an_exception(HostileCase c)
    {
        using var setup = new HostileSetup(Path.Combine(Root, c.File), c.Design);
        var (problems, lastLine) = setup.Run(check: c.Stage == "check");
        if (c.Code == "ok")
        {
            Assert.True(problems.Count == 0, string.Join("; ", problems.Select(p => $"{p.Code} {p.Location}: {p.What}")));
            Assert.Equal(c.Line, lastLine);
            return;
        }

        Assert.NotEmpty(problems);
        var first = problems[0];
        Assert.Equal((c.Code, c.Line, c.Column), (first.Code, first.Line, first.Column));
        Assert.False(string.IsNullOrWhiteSpace(first.What));
        Assert.False(string.IsNullOrWhiteSpace(first.Fix));
    }

    [Fact]
    public void Every_file_in_the_hostile_folder_is_listed_in_the_table()
    {
        var listed = HostileCase.Load(Path.Combine(Root, "cases.tsv")).Select(c => c.File).ToHashSet(StringComparer.Ordinal);
        var files = Directory.EnumerateFiles(Root, "*", SearchOption.AllDirectories)
            .Select(f => Path.GetRelativePath(Root, f).Replace('\\', '/'))
            .Where(f => f != "cases.tsv" && f != "README.md");
        Assert.All(files, f => Assert.Contains(f, listed));
    }
}
