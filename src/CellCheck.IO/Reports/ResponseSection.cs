using CellCheck.Core.Analysis;
using Spectre.Console;

namespace CellCheck.IO.Reports;

/// <summary>The terminal block of one response.</summary>
internal static class ResponseSection
{
    public static void Write(IAnsiConsole console, ResponseReport r, IReadOnlyList<string> factors)
    {
        var unit = r.Unit is null ? string.Empty : $" ({r.Unit})";
        var title = $"Response {r.Response}{unit}: {TerminalReportWriter.Status(r.Verdict.Status)}";
        console.Write(new Rule(Markup.Escape(title)) { Justification = Justify.Left });
        foreach (var finding in r.Verdict.Findings)
        {
            console.Write(new Padder(new Text("- " + finding), new Padding(2, 0, 0, 0)));
        }

        console.WriteLine();
        AssumptionTable.Write(console, r.Verdict);
        console.WriteLine();
        ModelSection.Write(console, r.Model);
        OrderSection.Write(console, r.Order);
        console.WriteLine();
        var c = r.Census;
        var replicates = NumberText.Range(c.MinReplicates, c.MaxReplicates);
        console.Write(new Text($"Census: {c.Cells} cells of {NumberText.Value(c.Combinations, 12)} combinations, {replicates} values per cell, "
            + $"{(c.Balanced ? "balanced" : "unbalanced")}, {c.EmptyCount} empty, {c.Singletons} singleton(s); "
            + $"{r.RowsUsed} rows used, {r.Excluded.Count} excluded.\n"));
        if (c.Empty.Count > 0)
        {
            var listed = string.Join("; ", c.Empty.Take(10).Select(e => string.Join(", ", e.Select((l, i) => factors[i] + "=" + l))));
            console.Write(new Text("Empty: " + listed + (c.EmptyCount > 10 ? $"; and {c.EmptyCount - 10} more" : string.Empty) + "\n"));
        }

        ReplicatesSection.Write(console, r);

        console.WriteLine();
        CellTable.Write(console, r, factors);
        CheckTable.Write(console, "Supporting: pooled residuals (" + r.Pooled.Residuals + ", internally studentized, n = " + NumberText.Count(r.Pooled.N) + ", asymptotic p)", r.Pooled.Checks);
        Notes(console, r.Pooled.Notes);
        CheckTable.Write(console, "Supporting: spread across cells (" + NumberText.Count(r.Spread.CellsUsed) + " cells with 2 or more values, asymptotic p)", r.Spread.Checks);
        if (r.Spread.SdRatio is { } ratio)
        {
            console.Write(new Text("Largest / smallest cell SD: " + NumberText.Fixed(ratio, 2) + "\n"));
        }

        Notes(console, r.Spread.Notes);
        ExcludedRows(console, r);
        RemedySection.Write(console, r);
    }

    private static void Notes(IAnsiConsole console, IEnumerable<string> notes)
    {
        foreach (var note in notes)
        {
            console.Write(new Text("Note: " + note + "\n"));
        }
    }

    private static void ExcludedRows(IAnsiConsole console, ResponseReport r)
    {
        if (r.Excluded.Count == 0)
        {
            return;
        }

        console.WriteLine();
        console.Write(new Text($"Excluded rows ({r.Excluded.Count}):\n"));
        foreach (var x in r.Excluded.Take(TerminalReportWriter.ExcludedRowsLimit))
        {
            console.Write(new Text($"  line {x.Line}: {x.Reason}\n"));
        }

        if (r.Excluded.Count > TerminalReportWriter.ExcludedRowsLimit)
        {
            console.Write(new Text($"  and {r.Excluded.Count - TerminalReportWriter.ExcludedRowsLimit} more (all are listed in the JSON report)\n"));
        }
    }
}
