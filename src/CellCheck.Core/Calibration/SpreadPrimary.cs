namespace CellCheck.Core.Calibration;

/// <summary>The test that decides the equal-spread assumption.</summary>
public enum SpreadPrimary
{
    /// <summary>Fewer than two cells with two or more values.</summary>
    None,

    /// <summary>Brown-Forsythe (median-centred Levene, Brown &amp; Forsythe 1974).</summary>
    BrownForsythe,

    /// <summary>Brown-Forsythe with structural zeros removed (Hines &amp; O'Hara Hines 2000), for balanced designs of odd n.</summary>
    BrownForsytheZerosRemoved,

    /// <summary>Bartlett's test, when every cell has exactly two values and deviation-based tests are degenerate.</summary>
    Bartlett,
}
