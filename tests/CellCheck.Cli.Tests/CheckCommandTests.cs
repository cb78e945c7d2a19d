using System.Text.Json;

namespace CellCheck.Cli.Tests;

public sealed class CheckCommandTests
{
    [Fact]
    public void The_coating_demo_flags_the_uneven_cell_and_exits_with_one()
    {
        var (code, output, _) = CliRunner.Run("check", CliRunner.Design("coating-cure.yaml"));
        Assert.Equal(1, code);
        Assert.Contains("cure_temp=200, line_speed=fast, primer=B", output, StringComparison.Ordinal);
    }

    [Fact]
    public void The_coating_demo_terminal_report_matches_its_golden_file()
    {
        var (_, output, _) = CliRunner.Run("check", CliRunner.Design("coating-cure.yaml"));
        GoldenFile.Match("coating-cure.txt", CliRunner.Portable(output));
    }

    [Fact]
    public void The_assay_demo_terminal_report_matches_its_golden_file()
    {
        var (_, output, _) = CliRunner.Run("check", CliRunner.Design("assay-lab.yaml"));
        GoldenFile.Match("assay-lab.txt", CliRunner.Portable(output));
    }

    [Fact]
    public void The_field_trial_demo_runs_model_based_checks_and_matches_its_golden_file()
    {
        var folder = Path.Combine(Path.GetTempPath(), "cellcheck-cli-" + Guid.NewGuid().ToString("N"));
        try
        {
            var (code, output, _) = CliRunner.Run("check", CliRunner.Design("field-trial.yaml"), "--out", folder);
            Assert.Equal(0, code);
            Assert.Contains("one row per block", output, StringComparison.Ordinal);
            GoldenFile.Match("field-trial.txt", CliRunner.Portable(output.Replace(folder, "OUT", StringComparison.Ordinal)));
            var csv = File.ReadAllLines(Path.Combine(folder, "diagnostics.csv"));
            Assert.Equal("response,line,nitrogen,variety,fitted,residual,studentized,studentized_external,leverage,cooks_distance", csv[0]);
            Assert.Equal(25, csv.Length);
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    [Fact]
    public void Out_writes_the_pictures_at_the_chosen_resolution_unless_told_not_to()
    {
        var folder = Path.Combine(Path.GetTempPath(), "cellcheck-cli-" + Guid.NewGuid().ToString("N"));
        try
        {
            var (code, _, err) = CliRunner.Run("check", CliRunner.Design("oven-drift.yaml"), "--out", folder, "--dpi", "72", "--quiet");
            Assert.Equal((1, string.Empty), (code, err));
            var names = Directory.GetFiles(folder).Select(f => Path.GetFileName(f)).Order(StringComparer.Ordinal).ToArray();
            Assert.Equal(["diagnostics.csv", "hardness-cells.png", "hardness-cells.svg", "hardness-pooled.png", "hardness-pooled.svg", "report.html", "report.json"], names);
            var at72 = new FileInfo(Path.Combine(folder, "hardness-pooled.png")).Length;

            CliRunner.Run("check", CliRunner.Design("oven-drift.yaml"), "--out", folder, "--quiet");
            Assert.True(new FileInfo(Path.Combine(folder, "hardness-pooled.png")).Length > at72, "150 dpi is the default and larger than 72 dpi");

            var bare = Path.Combine(folder, "bare");
            CliRunner.Run("check", CliRunner.Design("oven-drift.yaml"), "--out", bare, "--no-pictures", "--quiet");
            Assert.Equal(["diagnostics.csv", "report.html", "report.json"], Directory.GetFiles(bare).Select(f => Path.GetFileName(f)).Order(StringComparer.Ordinal).ToArray());
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    [Theory]
    [InlineData("10")]
    [InlineData("601")]
    public void A_resolution_out_of_range_is_a_usage_error(string dpi)
    {
        var (code, _, err) = CliRunner.Run("check", CliRunner.Design("oven-drift.yaml"), "--dpi", dpi);
        Assert.Equal(2, code);
        Assert.Contains("--dpi", err, StringComparison.Ordinal);
    }

    [Fact]
    public void A_drift_in_run_order_is_flagged_and_the_same_data_in_shuffled_order_are_not()
    {
        var (drift, driftOut, _) = CliRunner.Run("check", CliRunner.Design("oven-drift.yaml"));
        Assert.Equal(1, drift);
        Assert.Contains("not independent in run order", driftOut, StringComparison.Ordinal);
        var (shuffled, shuffledOut, _) = CliRunner.Run("check", CliRunner.Design("oven-drift-shuffled.yaml"));
        Assert.Equal(0, shuffled);
        Assert.DoesNotContain("not independent", shuffledOut, StringComparison.Ordinal);
    }

    [Fact]
    public void The_json_report_matches_its_golden_file_and_the_schema_keys()
    {
        var folder = Path.Combine(Path.GetTempPath(), "cellcheck-cli-" + Guid.NewGuid().ToString("N"));
        try
        {
            var json = Path.Combine(folder, "nested", "report.json");
            var (code, _, err) = CliRunner.Run("check", CliRunner.Design("coating-cure.yaml"), "--json", json, "--out", folder);
            Assert.Equal(1, code);
            Assert.Equal(string.Empty, err);
            var text = File.ReadAllText(json);
            Assert.Equal(text, File.ReadAllText(Path.Combine(folder, "report.json")));
            GoldenFile.Match("coating-cure.json", CliRunner.Portable(text));

            using var doc = JsonDocument.Parse(text);
            var root = doc.RootElement;
            Assert.Equal("cellcheck-report", root.GetProperty("format").GetString());
            Assert.Equal(1, root.GetProperty("version").GetInt32());
            foreach (var key in new[] { "file", "data", "alpha", "adjust" })
            {
                Assert.True(root.GetProperty("design").TryGetProperty(key, out _), key);
            }

            var response = root.GetProperty("responses")[0];
            foreach (var key in new[] { "response", "rows", "census", "cells", "pooled", "spread", "verdict" })
            {
                Assert.True(response.TryGetProperty(key, out _), key);
            }

            var check = response.GetProperty("cells")[0].GetProperty("checks")[0];
            foreach (var key in new[] { "check", "statistic", "p", "p_adjusted", "status" })
            {
                Assert.True(check.TryGetProperty(key, out _), key);
            }

            Assert.Equal(JsonValueKind.Array, response.GetProperty("spread").GetProperty("checks")[0].GetProperty("df").ValueKind);
            Assert.Empty(Directory.GetFiles(folder, "*.tmp", SearchOption.AllDirectories));
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    [Fact]
    public void The_assay_demo_lists_its_excluded_row_and_singleton()
    {
        var (code, output, _) = CliRunner.Run("check", CliRunner.Design("assay-lab.yaml"));
        Assert.Equal(0, code);
        Assert.Contains("line 11: missing value", output, StringComparison.Ordinal);
        Assert.Contains("1 singleton", output, StringComparison.Ordinal);
    }

    [Fact]
    public void A_missing_column_gives_a_located_message_and_exit_two()
    {
        var folder = Path.Combine(Path.GetTempPath(), "cellcheck-cli-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(folder);
        try
        {
            File.WriteAllText(Path.Combine(folder, "d.csv"), "a,y\n1,2\n");
            var design = Path.Combine(folder, "d.yaml");
            File.WriteAllText(design, "data: d.csv\nfactors: [b]\nresponses: [y]\n");
            var (code, output, err) = CliRunner.Run("check", design);
            Assert.Equal(2, code);
            Assert.Equal(string.Empty, output);
            Assert.Contains("error [design.missing-column] " + design + ":2:11", err, StringComparison.Ordinal);
            Assert.Contains("fix:", err, StringComparison.Ordinal);
            Assert.DoesNotContain("   at ", err, StringComparison.Ordinal);
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    [Fact]
    public void Writing_a_report_over_an_input_is_refused_with_exit_two()
    {
        var data = CliRunner.Design("coating-cure.csv");
        var before = File.ReadAllText(data);
        var (code, _, err) = CliRunner.Run("check", CliRunner.Design("coating-cure.yaml"), "--json", data);
        Assert.Equal(2, code);
        Assert.Contains("output.is-input", err, StringComparison.Ordinal);
        Assert.Equal(before, File.ReadAllText(data));
    }

    [Theory]
    [InlineData("check")]
    [InlineData("check", "x.yaml", "--adjust", "bonferroni")]
    [InlineData("frobnicate")]
    [InlineData("check", "x.yaml", "--alpha", "2")]
    public void Usage_errors_exit_with_two(params string[] args)
    {
        var (code, _, err) = CliRunner.Run(args);
        Assert.Equal(2, code);
        Assert.Contains("error", err, StringComparison.Ordinal);
    }

    [Fact]
    public void A_missing_design_file_exits_with_two()
    {
        var (code, _, err) = CliRunner.Run("check", "no/such/design.yaml");
        Assert.Equal(2, code);
        Assert.Contains("design.not-found", err, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--help")]
    [InlineData("check", "--help")]
    public void Help_works_on_every_command_and_documents_the_exit_codes(params string[] args)
    {
        var (code, output, _) = CliRunner.Run(args);
        Assert.Equal(0, code);
        Assert.Contains("Exit codes: 0 = checks ran, nothing flagged", output, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--version")]
    [InlineData("check", "--version")]
    public void Version_works_on_every_command(params string[] args)
    {
        var (code, output, _) = CliRunner.Run(args);
        Assert.Equal(0, code);
        Assert.Matches(@"^\d+\.\d+\.\d+", output.Trim());
    }
}
