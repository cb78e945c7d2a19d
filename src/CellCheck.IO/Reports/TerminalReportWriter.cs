using CellCheck.Core.Analysis;
using Spectre.Console;
using Spectre.Console.Rendering;

namespace CellCheck.IO.Reports;

/// <summary>
/// Writes the terminal summary: per response a verdict in words, the census, the per-cell table, pooled and
/// spread tables and excluded rows; then the caution. Fits 100 columns. Text from the user's files is never read as markup.
/// </summary>
public static class TerminalReportWriter
{
    /// <summary>Above this many cells only flagged and not-testable cells are listed.</summary>
    public const int CellRowsLimit = 60;

    /// <summary>At most this many excluded rows are listed; the JSON report has them all.</summary>
    public const int ExcludedRowsLimit = 20;

    public static void Write(CheckReport report, TextWriter writer, string toolVersion, int width = 100, bool color = false)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(writer);
        using var buffer = new StringWriter(System.Globalization.CultureInfo.InvariantCulture);
        var console = AnsiConsole.Create(new AnsiConsoleSettings
        {
            Ansi = color ? AnsiSupport.Yes : AnsiSupport.No,
            ColorSystem = color ? ColorSystemSupport.Standard : ColorSystemSupport.NoColors,
            Interactive = InteractionSupport.No,
            Out = new AnsiConsoleOutput(buffer),
        });
        console.Profile.Width = width;
        var d = report.Design;
        console.Write(new Text($"cellcheck {toolVersion} | design {d.DesignFile}\n"));
        console.Write(new Text($"data {d.DataFile}\n"));
        console.Write(new Text($"alpha {NumberText.Value(d.Alpha)} | within-cell p adjusted ({d.Adjust}) across {d.AdjustAcross} | factors: {string.Join(", ", d.Factors)}"
            + (d.FilteredOut > 0 ? $" | {d.FilteredOut} rows filtered out by where" : string.Empty) + "\n"));
        foreach (var response in report.Responses)
        {
            console.WriteLine();
            ResponseSection.Write(console, response, report.Design.Factors);
        }

        console.WriteLine();
        console.Write(new Text(CheckReport.Caution + "\n"));
        foreach (var line in buffer.ToString().TrimEnd().Split('\n'))
        {
            writer.Write(line.TrimEnd());
            writer.Write('\n');
        }
    }

    internal static IRenderable Plain(string text) => new Text(text);

    internal static string Status(CheckStatus status) => status switch
    {
        CheckStatus.Pass => "pass",
        CheckStatus.Flag => "FLAG !",
        _ => "not-testable",
    };

    internal static string Status(CheckResult check) =>
        check.Status == CheckStatus.NotTestable ? "not-testable: " + check.Reason : Status(check.Status);
}
