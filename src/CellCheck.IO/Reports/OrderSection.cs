using CellCheck.Core.Analysis;
using Spectre.Console;

namespace CellCheck.IO.Reports;

/// <summary>The terminal block about run order.</summary>
internal static class OrderSection
{
    public static void Write(IAnsiConsole console, OrderResult o)
    {
        if (o.Column is null)
        {
            foreach (var note in o.Notes)
            {
                console.Write(new Text("Run order: " + note + "\n"));
            }

            return;
        }

        CheckTable.Write(console, "Run order (column " + o.Column + ", " + NumberText.Count(o.Rows) + " rows; Durbin-Watson "
            + (o.Method ?? "not computed") + ", E[d] " + NumberText.Value(o.ExpectedD ?? double.NaN, 4) + ", lag-1 autocorrelation "
            + NumberText.Fixed(o.Lag1 ?? double.NaN, 3) + ")", o.Checks);
        foreach (var b in o.ByBlock)
        {
            console.Write(new Text("  block " + b.Block + ": " + NumberText.Count(b.Rows) + " rows, d " + NumberText.Value(b.D ?? double.NaN, 4)
                + ", lag-1 " + NumberText.Fixed(b.Lag1 ?? double.NaN, 3) + ", "
                + string.Join(", ", b.Checks.Select(c => c.Check + " p " + NumberText.P(c.P ?? double.NaN))) + "\n"));
        }

        foreach (var note in o.Notes)
        {
            console.Write(new Text("Note: " + note + "\n"));
        }
    }
}
