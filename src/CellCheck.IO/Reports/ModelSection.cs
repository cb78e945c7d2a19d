using CellCheck.Core.Analysis;
using Spectre.Console;

namespace CellCheck.IO.Reports;

/// <summary>The terminal block about the fitted model: terms, rank, aliased columns, form checks and effects.</summary>
internal static class ModelSection
{
    public static void Write(IAnsiConsole console, ModelResult m)
    {
        var i = m.Info;
        console.Write(new Text($"Model: {i.Name} (rank {i.Rank} of {i.Columns} columns, {i.ResidualDf} residual df)"
            + (i.AliasedColumns.Count > 0 ? "; aliased, not estimated: " + string.Join(", ", i.AliasedColumns) : string.Empty) + "\n"));
        CheckTable.Write(console, "Model form (not part of the verdict's family)", m.Checks);
        if (m.Effects is { } e)
        {
            console.Write(new Text($"Effects of the unreplicated two-level factorial (Lenth PSE {NumberText.Value(e.PseudoStandardError, 4)}, "
                + $"margin {NumberText.Value(e.MarginOfError, 4)}, simultaneous {NumberText.Value(e.SimultaneousMargin, 4)})\n"));
            var table = new Table().Border(TableBorder.Minimal);
            table.AddColumn("term");
            table.AddColumn(new TableColumn("effect").RightAligned());
            table.AddColumn(new TableColumn("half-normal q").RightAligned());
            table.AddColumn("beyond margin");
            foreach (var j in Enumerable.Range(0, e.Effects.Length).OrderByDescending(j => Math.Abs(e.Effects[j])))
            {
                table.AddRow(TerminalReportWriter.Plain(m.EffectNames[j]), TerminalReportWriter.Plain(NumberText.Value(e.Effects[j], 4)),
                    TerminalReportWriter.Plain(NumberText.Fixed(e.HalfNormalQuantiles[j], 3)),
                    TerminalReportWriter.Plain(Math.Abs(e.Effects[j]) > e.SimultaneousMargin ? "yes (simultaneous)" : Math.Abs(e.Effects[j]) > e.MarginOfError ? "yes" : "no"));
            }

            console.Write(table);
        }
    }
}
