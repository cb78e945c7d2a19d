using System.Text.Json;

namespace CellCheck.Cli.Tests;

/// <summary>The --transform and --shift options: advice without them, a re-check with them, exit codes.</summary>
public sealed class TransformCommandTests
{
    [Fact]
    public void The_assay_whose_spread_grows_with_the_mean_is_flagged_and_log_is_recommended()
    {
        var (code, output, _) = CliRunner.Run("check", CliRunner.Design("fluorescence-assay.yaml"));
        Assert.Equal(1, code);
        Assert.Contains("Spread differs across cells", output, StringComparison.Ordinal);
        Assert.Contains("Recommended: log, log(signal).", output, StringComparison.Ordinal);
        Assert.DoesNotContain("Before and after", output, StringComparison.Ordinal);
    }

    [Fact]
    public void The_recommended_transformation_removes_the_flag_and_the_exit_code_follows_it()
    {
        var (code, output, _) = CliRunner.Run("check", CliRunner.Design("fluorescence-assay.yaml"), "--transform", "auto");
        Assert.Equal(0, code);
        Assert.Contains("After log(signal): pass", output, StringComparison.Ordinal);
        GoldenFile.Match("fluorescence-assay-auto.txt", CliRunner.Portable(output));
    }

    [Fact]
    public void Quiet_output_names_the_status_after_the_transformation()
    {
        var (code, output, _) = CliRunner.Run("check", CliRunner.Design("fluorescence-assay.yaml"), "--transform", "log", "--quiet");
        Assert.Equal(0, code);
        Assert.Equal("signal: flag (after log: pass)", output.Trim());
    }

    [Fact]
    public void A_transformation_that_does_not_help_keeps_the_flag()
    {
        // the reciprocal over-corrects a spread that grows in proportion to the mean
        var (code, output, _) = CliRunner.Run("check", CliRunner.Design("fluorescence-assay.yaml"), "--transform", "reciprocal");
        Assert.Equal(1, code);
        Assert.Contains("After 1/signal: FLAG !", output, StringComparison.Ordinal);
        Assert.Contains("Advice: Spread differs and no power transformation removes it", output, StringComparison.Ordinal);
        Assert.Contains("Welch's (1951) ANOVA", output, StringComparison.Ordinal);
        Assert.Contains("pre-tests has error rates of its own", output, StringComparison.Ordinal);
    }

    [Fact]
    public void The_json_report_carries_the_remedy_and_the_full_report_after_it()
    {
        var folder = Path.Combine(Path.GetTempPath(), "cellcheck-cli-" + Guid.NewGuid().ToString("N"));
        try
        {
            var json = Path.Combine(folder, "report.json");
            var (code, _, err) = CliRunner.Run("check", CliRunner.Design("fluorescence-assay.yaml"), "--transform", "auto", "--json", json);
            Assert.Equal(0, code);
            Assert.Equal(string.Empty, err);
            using var doc = JsonDocument.Parse(File.ReadAllText(json));
            var response = doc.RootElement.GetProperty("responses")[0];
            var remedy = response.GetProperty("remedy");
            var boxCox = remedy.GetProperty("box_cox");
            Assert.Equal(2, boxCox.GetProperty("ci").GetArrayLength());
            Assert.Equal("cell-means", boxCox.GetProperty("model").GetString());
            Assert.True(remedy.GetProperty("spread_level").TryGetProperty("slope", out _));
            Assert.True(remedy.GetProperty("spread_level").TryGetProperty("power", out _));
            Assert.Equal("log", remedy.GetProperty("recommended").GetString());
            Assert.Equal("log", remedy.GetProperty("applied").GetString());
            var after = remedy.GetProperty("after");
            foreach (var key in new[] { "response", "rows", "census", "cells", "model", "order", "pooled", "spread", "verdict" })
            {
                Assert.True(after.TryGetProperty(key, out _), key);
            }

            Assert.Equal("flag", response.GetProperty("verdict").GetProperty("status").GetString());
            Assert.Equal("pass", after.GetProperty("verdict").GetProperty("status").GetString());
            Assert.Equal(JsonValueKind.Null, after.GetProperty("remedy").ValueKind);
            Assert.True(remedy.GetProperty("comparison").GetArrayLength() > 3);
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    [Theory]
    [InlineData("--transform", "cube")]
    [InlineData("--transform", "power:x")]
    [InlineData("--shift", "1")]
    public void A_bad_transformation_is_a_usage_problem_with_exit_two(params string[] options)
    {
        var (code, output, err) = CliRunner.Run(["check", CliRunner.Design("fluorescence-assay.yaml"), .. options]);
        Assert.Equal(2, code);
        Assert.Equal(string.Empty, output);
        Assert.Contains("error [usage.bad-", err, StringComparison.Ordinal);
        Assert.Contains("fix:", err, StringComparison.Ordinal);
    }

    [Fact]
    public void Help_documents_the_transformation_and_its_exit_code()
    {
        var (_, output, _) = CliRunner.Run("check", "--help");
        Assert.Contains("--transform", output, StringComparison.Ordinal);
        Assert.Contains("--shift", output, StringComparison.Ordinal);
        Assert.Contains("in the transformed response", output, StringComparison.Ordinal);
    }
}
