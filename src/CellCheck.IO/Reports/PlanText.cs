using CellCheck.Core.Analysis;
using CellCheck.Core.Planning;

namespace CellCheck.IO.Reports;

/// <summary>Words the plan reports share.</summary>
internal static class PlanText
{
    public const string Caution =
        "A plan rests on the stated smallest effect and on the SD, which the next run may not share: an SD estimated from few "
        + "residual degrees of freedom is itself uncertain, so add a margin. Power is for the F test of each term at alpha, "
        + "one term at a time. These numbers support judgement; they do not replace it.";

    public static string Layout(PlannedDesign d) =>
        NumberText.Count(d.Cells) + " cells (" + string.Join(" × ", d.Factors.Select(f => f.Name + " " + NumberText.Count(f.Levels) + (f.IsNumeric ? " numeric" : string.Empty))) + ")";

    public static string Effect(SmallestEffect e) => e.Scale == EffectScale.CohenF
        ? "Cohen's f = " + NumberText.Value(e.Value)
        : "a difference of " + NumberText.Value(e.Value) + " between means (in each response's unit)";

    public static string Power(double p) => double.IsNaN(p) ? "-" : NumberText.Fixed(p, 3);

    public static string Percent(double rate) => NumberText.Fixed(100 * rate, 0) + "%";
}
