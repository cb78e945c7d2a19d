namespace CellCheck.Core.Calibration;

/// <summary>
/// Chooses one primary test per assumption from the design's cell sizes. The other tests are reported as
/// supporting evidence and do not drive the verdict. The reasons are written into every report.
/// </summary>
public static class PrimaryRules
{
    /// <summary>Shapiro-Wilk's p approximation holds up to this many values (Royston 1995, algorithm AS R94).</summary>
    public const int ShapiroWilkLimit = 5000;

    public static PrimaryChoice Choose(DesignShape shape) => Choose(shape, shape?.Count ?? 0);

    /// <summary>Chooses the primary checks for replicated cells of these sizes and this many usable residuals.</summary>
    public static PrimaryChoice Choose(DesignShape shape, int usableResiduals)
    {
        ArgumentNullException.ThrowIfNull(shape);
        var (normality, normalityReason) = usableResiduals switch
        {
            < 3 => (NormalityPrimary.None, "fewer than three usable residuals: normality cannot be judged"),
            <= ShapiroWilkLimit => (NormalityPrimary.ShapiroWilkPooled,
                "Shapiro-Wilk on the pooled studentized residuals: among the common omnibus tests it has the best power over a wide "
                + "range of alternatives (Razali & Wah 2011); one pooled test sees more than many small per-cell tests and adds no "
                + "multiplicity; its p-value is calibrated by simulation for this design because residuals of one cell are not independent"),
            _ => (NormalityPrimary.AndersonDarlingPooled,
                "Anderson-Darling on the pooled studentized residuals: Shapiro-Wilk's p approximation holds only up to 5000 values "
                + "(Royston 1995), and Anderson-Darling is the most powerful of the distance tests (Stephens 1974)"),
        };

        var replicated = shape.Sizes.Length;
        var balancedOdd = replicated > 0 && shape.Sizes[0] == shape.Sizes[^1] && shape.Sizes[0] % 2 == 1;
        var (spread, spreadReason) = replicated < 2
            ? (SpreadPrimary.None, "fewer than two cells with two or more values: spread cannot be compared")
            : shape.Sizes[^1] == 2
                ? (SpreadPrimary.Bartlett,
                    "Bartlett: every cell has two values, so tests on absolute deviations are degenerate; Bartlett's test is exact "
                    + "under normal errors but oversensitive to non-normality, so read it together with the normality verdict")
                : balancedOdd
                    ? (SpreadPrimary.BrownForsytheZerosRemoved,
                        "Brown-Forsythe with structural zeros removed: median-centred deviations keep the test valid under skewed errors "
                        + "(Conover, Johnson & Johnson 1981); with every cell of the same odd size the median forces one zero deviation "
                        + "per cell, and removing it (Hines & O'Hara Hines 2000) makes heavy tails pass for unequal spread far less often at small "
                        + "n, for a point or two of power (docs/calibration.md)")
                    : (SpreadPrimary.BrownForsythe,
                        "Brown-Forsythe: median-centred deviations keep the test valid under skewed and heavy-tailed errors (Conover, "
                        + "Johnson & Johnson 1981), where mean-centred Levene is liberal with small cells and Bartlett mistakes heavy "
                        + "tails for unequal spread; its p-value is calibrated by simulation, which removes its conservatism at small n");
        return new PrimaryChoice(normality, normalityReason, spread, spreadReason);
    }
}
