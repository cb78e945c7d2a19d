using System.Text.Json;

namespace CellCheck.Cli.Tests;

public sealed class PlanCommandTests
{
    [Fact]
    public void The_oven_plan_matches_its_golden_files()
    {
        var folder = Path.Combine(Path.GetTempPath(), "cellcheck-plan-" + Guid.NewGuid().ToString("N"));
        try
        {
            var json = Path.Combine(folder, "plan.json");
            var (code, output, err) = CliRunner.Run("plan", CliRunner.Design("oven-drift.yaml"), "--effect", "1.5", "--json", json);
            Assert.Equal(0, code);
            Assert.Equal(string.Empty, err);
            GoldenFile.Match("oven-drift-plan.txt", CliRunner.Portable(output.Replace(folder, "OUT", StringComparison.Ordinal)));
            var text = File.ReadAllText(json);
            GoldenFile.Match("oven-drift-plan.json", CliRunner.Portable(text));
            using var doc = JsonDocument.Parse(text);
            var root = doc.RootElement;
            Assert.Equal("cellcheck-plan", root.GetProperty("format").GetString());
            var term = root.GetProperty("responses")[0].GetProperty("terms")[0];
            foreach (var key in new[] { "term", "df", "now", "replicates_needed", "replicates_exact", "at_needed", "below_needed", "reason" })
            {
                Assert.True(term.TryGetProperty(key, out _), key);
            }

            Assert.Equal(10, root.GetProperty("checks").GetArrayLength());
        }
        finally
        {
            if (Directory.Exists(folder))
            {
                Directory.Delete(folder, recursive: true);
            }
        }
    }

    [Fact]
    public void Cohens_f_plans_a_chosen_response_of_a_factorial_with_a_numeric_factor()
    {
        var (code, output, _) = CliRunner.Run("plan", CliRunner.Design("coating-cure.yaml"), "--effect", "f=0.25", "--response", "gloss",
            "--power", "0.9", "--draws", "20");
        Assert.Equal(0, code);
        Assert.Contains("Cohen's f = 0.25", output, StringComparison.Ordinal);
        Assert.Contains("Response gloss", output, StringComparison.Ordinal);
        Assert.DoesNotContain("Response adhesion", output, StringComparison.Ordinal);
        Assert.Contains("cure_temp*line_speed*primer", output, StringComparison.Ordinal);
    }

    [Fact]
    public void A_plan_without_an_effect_is_a_located_problem_with_exit_code_two()
    {
        var (code, output, err) = CliRunner.Run("plan", CliRunner.Design("coating-cure.yaml"));
        Assert.Equal(2, code);
        Assert.Equal(string.Empty, output);
        Assert.Contains("error [plan.missing-effect] command line (--effect)", err, StringComparison.Ordinal);
        Assert.Contains("fix:", err, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--effect", "big", "plan.bad-effect")]
    [InlineData("--effect", "f=-1", "plan.bad-effect")]
    [InlineData("--sd", "0", "plan.bad-sd")]
    [InlineData("--power", "1.5", "plan.bad-power")]
    [InlineData("--alpha", "0.9", "plan.bad-alpha")]
    [InlineData("--draws", "3", "plan.bad-draws")]
    public void Bad_plan_options_are_located_problems(string option, string value, string problemCode)
    {
        var args = option == "--effect"
            ? new[] { "plan", CliRunner.Design("coating-cure.yaml"), option, value }
            : ["plan", CliRunner.Design("coating-cure.yaml"), "--effect", "0.5", option, value];
        var (code, _, err) = CliRunner.Run(args);
        Assert.Equal(2, code);
        Assert.Contains("error [" + problemCode + "]", err, StringComparison.Ordinal);
    }

    [Fact]
    public void An_unknown_response_gets_the_nearest_name()
    {
        var (code, _, err) = CliRunner.Run("plan", CliRunner.Design("coating-cure.yaml"), "--effect", "0.5", "--response", "glos");
        Assert.Equal(2, code);
        Assert.Contains("plan.unknown-response", err, StringComparison.Ordinal);
        Assert.Contains("'gloss'", err, StringComparison.Ordinal);
    }

    [Fact]
    public void The_plan_never_overwrites_its_data_file()
    {
        var (code, _, err) = CliRunner.Run("plan", CliRunner.Design("oven-drift.yaml"), "--effect", "1", "--draws", "20", "--json", CliRunner.Design("oven-drift.csv"));
        Assert.Equal(2, code);
        Assert.Contains("output.is-input", err, StringComparison.Ordinal);
    }
}
