using System.Globalization;

namespace CellCheck.IO.Tests.Hostile;

/// <summary>
/// One row of <c>Fixtures/hostile/cases.tsv</c>: a hostile file, the design it is read with (<c>-</c> for a design
/// file), how far it is taken (<c>read</c>: the readers; <c>check</c>: every check and report writer too), and the
/// expected outcome: the first problem's code, line and column (<c>-</c> when none), or <c>ok</c> with the line of
/// the last row read.
/// </summary>
public sealed record HostileCase(string File, string Design, string Stage, string Code, int? Line, int? Column, string Why)
{
    public static IEnumerable<HostileCase> Load(string tsv) => System.IO.File.ReadLines(tsv)
        .Where(l => l.Length > 0 && !l.StartsWith('#'))
        .Select(l => l.Split('\t'))
        .Select(f => new HostileCase(f[0], f[1], f[2], f[3], Number(f[4]), Number(f[5]), f.Length > 6 ? f[6] : string.Empty));

    public override string ToString() => File;

    private static int? Number(string text) => text == "-" ? null : int.Parse(text, CultureInfo.InvariantCulture);
}
