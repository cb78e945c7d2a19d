using System.Reflection;
using System.Text.RegularExpressions;

namespace CellCheck.IO.Tests.Catalogue;

/// <summary>The README's error catalogue documents every problem code in ProblemCodes, and nothing else.</summary>
public sealed partial class ErrorCatalogueTests
{
    private static readonly string[] Codes = typeof(ProblemCodes).GetFields(BindingFlags.Public | BindingFlags.Static)
        .Where(f => f.IsLiteral && f.FieldType == typeof(string))
        .Select(f => (string)f.GetRawConstantValue()!)
        .ToArray();

    private static string Readme()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "CellCheck.sln")))
        {
            dir = dir.Parent;
        }

        return File.ReadAllText(Path.Combine(dir?.FullName ?? throw new InvalidOperationException("CellCheck.sln not found"), "README.md"));
    }

    [Fact]
    public void Every_problem_code_has_a_row_with_an_example_and_a_fix_in_the_readme_catalogue()
    {
        var rows = CatalogueRows().Matches(Readme()).ToDictionary(m => m.Groups["code"].Value, m => m.Value, StringComparer.Ordinal);
        Assert.All(Codes, code =>
        {
            Assert.True(rows.TryGetValue(code, out var row), $"{code} has no row in the README's error catalogue");
            var cells = row!.Split('|', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries);
            Assert.True(cells.Length >= 3 && cells[1].Length > 0 && cells[2].Length > 0, $"{code}: the row needs an example and a fix");
        });
    }

    [Fact]
    public void The_catalogue_lists_no_code_that_does_not_exist()
    {
        var documented = CatalogueRows().Matches(Readme()).Select(m => m.Groups["code"].Value);
        Assert.All(documented, code => Assert.Contains(code, Codes));
    }

    [Fact]
    public void Problem_codes_are_unique_and_name_their_file()
    {
        Assert.Equal(Codes.Length, Codes.Distinct(StringComparer.Ordinal).Count());
        Assert.All(Codes, c => Assert.Matches("^(design|data|output|plan|usage)\\.[a-z]+(-[a-z]+)*$", c));
    }

    [Theory]
    [InlineData("missing")]
    [InlineData("not-a-number")]
    [InlineData("not-finite")]
    [InlineData("out-of-range")]
    [InlineData("missing-factor")]
    [InlineData("thousands-separator")]
    public void Every_exclusion_code_the_reader_gives_is_documented(string code)
    {
        var readme = Readme();
        var start = readme.IndexOf("Excluded rows carry their own codes", StringComparison.Ordinal);
        Assert.True(start >= 0);
        var paragraph = readme[start..readme.IndexOf("\n\n", start, StringComparison.Ordinal)];
        Assert.Contains($"`{code}`", paragraph, StringComparison.Ordinal);
    }

    [GeneratedRegex(@"^\| `(?<code>(design|data|output|plan|usage)\.[a-z-]+)` \|.*\|\s*$", RegexOptions.Multiline)]
    private static partial Regex CatalogueRows();
}
