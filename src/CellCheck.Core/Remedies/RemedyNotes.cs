using CellCheck.Core.Analysis;

namespace CellCheck.Core.Remedies;

/// <summary>The notes of a remedy, in words.</summary>
internal static class RemedyNotes
{
    public static List<string> Before(PowerFit? boxCox, PowerFit? yeoJohnson, TransformChoice? recommended, int nonPositive, double smallest, double largest, double shift, int outliers)
    {
        var notes = new List<string>();
        if (outliers > 0 && recommended is { IsIdentity: false })
        {
            notes.Add("Outlying rows were found: the estimated power is sensitive to single values, so settle them before choosing a transformation.");
        }

        if (shift != 0)
        {
            notes.Add("As stated, " + NumberText.Value(shift, 6) + " was added to every value before transforming; the estimate and the advice depend on it.");
        }

        if (nonPositive > 0)
        {
            notes.Add(NumberText.Count(nonPositive) + " value(s) are zero or negative (smallest " + NumberText.Value(smallest, 6)
                + "): Box-Cox powers and the log need positive values. Either state a shift C added to every value before transforming "
                + "(the result depends on C; nothing is shifted unless you say so) or use the Yeo-Johnson family (Yeo & Johnson 2000), "
                + "which takes values of any sign.");
        }

        var estimate = boxCox ?? yeoJohnson;
        var flat = estimate is not null && (estimate.CiLower is null || estimate.CiUpper is null) && estimate.Contains(1);
        if (flat)
        {
            notes.Add("The likelihood is nearly flat in λ" + (boxCox is not null && smallest > 0
                    ? ": the values span a narrow range for their level (largest / smallest " + NumberText.Value(largest / smallest, 3)
                      + "), over which every power acts almost linearly"
                    : string.Empty)
                + ". The power is not determined by these data, and none is needed.");
        }
        else if (estimate is { AtSearchBound: true } fit)
        {
            notes.Add("The estimated power lies at the end of the search range (" + NumberText.Value(fit.SearchLower) + " to "
                + NumberText.Value(fit.SearchUpper) + "): no power in that range fits well.");
        }

        if (recommended is { IsIdentity: true } && !flat)
        {
            notes.Add("λ = 1 is inside the 95% interval: no transformation is needed.");
        }
        else if (recommended is not null && !PowerLadder.Powers.Contains(recommended.Power))
        {
            notes.Add("No interpretable power (-1, -1/2, 0, 1/2) is inside the 95% interval; the recommendation is the estimate, rounded.");
        }

        return notes;
    }

    public static string NotApplied(string reason, TransformRequest request) => reason switch
    {
        RemedyReason.NotNeeded => "No transformation was applied: λ = 1 is inside the 95% interval; nothing was re-checked.",
        RemedyReason.NonPositiveValues => "The requested power was not applied: some values are zero or negative. State a shift, or use the Yeo-Johnson family.",
        RemedyReason.NotFinite => "The requested power was not applied: it takes some values beyond the range of double precision.",
        _ => "No transformation was applied: no power could be estimated for this response"
            + (request.IsAuto ? "." : " in the requested family."),
    };
}
