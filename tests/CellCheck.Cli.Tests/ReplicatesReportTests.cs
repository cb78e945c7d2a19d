using System.Text.Json;

namespace CellCheck.Cli.Tests;

public sealed class ReplicatesReportTests
{
    [Fact]
    public void The_json_report_carries_the_census_verdict_its_rule_and_the_sensitivity_table()
    {
        var folder = Path.Combine(Path.GetTempPath(), "cellcheck-rep-" + Guid.NewGuid().ToString("N"));
        try
        {
            var (_, _, err) = CliRunner.Run("check", CliRunner.Design("field-trial.yaml"), "--out", folder);
            Assert.Equal(string.Empty, err);
            using var doc = JsonDocument.Parse(File.ReadAllText(Path.Combine(folder, "report.json")));
            var replicates = doc.RootElement.GetProperty("responses")[0].GetProperty("replicates");
            // 4 plots per cell (one per block) and 15 residual df: fewer than 5 values per cell makes it marginal
            Assert.Equal("marginal", replicates.GetProperty("verdict").GetString());
            Assert.Contains("Mead 1988", replicates.GetProperty("rule").GetString(), StringComparison.Ordinal);
            Assert.Equal(15, replicates.GetProperty("residual_df").GetInt32());
            var rows = replicates.GetProperty("sensitivity");
            Assert.Equal(10, rows.GetArrayLength());
            foreach (var key in new[] { "check", "scope", "departure", "catches", "false_alarm", "reason" })
            {
                Assert.True(rows[0].TryGetProperty(key, out _), key);
            }

            Assert.Equal(400, replicates.GetProperty("sensitivity_method").GetProperty("draws").GetInt32());
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
    public void More_sensitivity_draws_can_be_asked_for_and_too_few_are_refused()
    {
        var json = Path.Combine(Path.GetTempPath(), "cellcheck-rep-" + Guid.NewGuid().ToString("N") + ".json");
        try
        {
            var (code, _, _) = CliRunner.Run("check", CliRunner.Design("oven-drift.yaml"), "--sensitivity-draws", "800", "--json", json);
            Assert.Equal(1, code);
            using var doc = JsonDocument.Parse(File.ReadAllText(json));
            var method = doc.RootElement.GetProperty("responses")[0].GetProperty("replicates").GetProperty("sensitivity_method");
            Assert.Equal(800, method.GetProperty("draws").GetInt32());
        }
        finally
        {
            File.Delete(json);
        }

        var (bad, _, err) = CliRunner.Run("check", CliRunner.Design("oven-drift.yaml"), "--sensitivity-draws", "5");
        Assert.Equal(2, bad);
        Assert.Contains("--sensitivity-draws", err, StringComparison.Ordinal);
    }

    [Fact]
    public void The_terminal_report_states_the_verdict_and_what_the_checks_could_have_seen()
    {
        var (_, output, _) = CliRunner.Run("check", CliRunner.Design("assay-lab.yaml"));
        Assert.Contains("Replicates: marginal. Rule:", output, StringComparison.Ordinal);
        Assert.Contains("What each check could have seen", output, StringComparison.Ordinal);
    }
}
