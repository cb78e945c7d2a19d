using CellCheck.Core.Analysis;
using CellCheck.Core.Calibration;
using CellCheck.Core.Cells;

namespace CellCheck.Core.Planning;

/// <summary>
/// The replicates section in plain words: the census verdict and why, the best chance any normality check and any
/// spread check that holds its alpha at these sizes had to see its departure, and the checks that flag clean data
/// more often than alpha (the lower end of the Wilson interval of their false-alarm rate above alpha).
/// </summary>
/// <remarks>
/// A chance of at least 0.80 is read as "would likely have been seen" (Cohen's 1988 convention for adequate power);
/// below 0.50 as "a pass says little" (common practice, no source).
/// </remarks>
public static class SensitivityWords
{
    public const double Likely = 0.80;
    public const double Little = 0.50;

    public static IReadOnlyList<string> Summarize(CensusVerdict verdict, Census census, int residualDf, SensitivityTable table)
    {
        ArgumentNullException.ThrowIfNull(verdict);
        ArgumentNullException.ThrowIfNull(census);
        ArgumentNullException.ThrowIfNull(table);
        var lines = new List<string>();
        var sizes = NumberText.Range(census.MinReplicates, census.MaxReplicates);
        var head = $"Census verdict {Word(verdict.Level)} ({sizes} value(s) per cell, {NumberText.Count(residualDf)} residual df)";
        lines.Add(verdict.Reasons.Count == 0 ? head + "." : head + ": " + string.Join("; ", verdict.Reasons) + ".");
        Best(lines, table, Departure.Lognormal, "a lognormal cell (shape 0.5)");
        Best(lines, table, Departure.VarianceRatio4, "a 4:1 variance ratio in one cell");
        var liberal = table.Rows.Where(r => r.FalseAlarm is { } f && f.Lower > table.Alpha)
            .Select(r => $"{r.Check} ({r.Scope}) {Percent(r.FalseAlarm!.Rate)}").ToList();
        if (liberal.Count > 0)
        {
            lines.Add($"At these cell sizes some checks flag clean data more often than alpha {NumberText.Value(table.Alpha)}: "
                + string.Join(", ", liberal) + "; read their flags with care.");
        }

        return lines;
    }

    public static string Word(ReplicationLevel level) => level switch
    {
        ReplicationLevel.Adequate => "adequate",
        ReplicationLevel.Marginal => "marginal",
        _ => "unreplicated",
    };

    private static void Best(List<string> lines, SensitivityTable table, Departure departure, string what)
    {
        // among the checks that hold their alpha here (a liberal check's catches are partly false alarms), or all if none does
        var candidates = table.Rows.Where(r => r.Departure == departure && r.Catches is not null).ToList();
        var honest = candidates.Where(r => r.FalseAlarm is { } f && f.Lower <= table.Alpha).ToList();
        var best = (honest.Count > 0 ? honest : candidates).MaxBy(r => r.Catches!.Rate);
        if (best is null)
        {
            return;
        }

        var rate = best.Catches!.Rate;
        var reading = rate >= Likely ? "a departure of this size would likely have been seen"
            : rate < Little ? "a pass says little about a departure of this size"
            : "a pass is only moderate evidence against a departure of this size";
        lines.Add($"The checks could have seen {what} at best {Percent(rate)} of the time ({best.Check}, {best.Scope}): {reading}.");
    }

    private static string Percent(double rate) => NumberText.Fixed(100 * rate, 0) + "%";
}
