namespace CellCheck.Core.Analysis;

/// <summary>Stable names of the checks as written in every report.</summary>
public static class CheckNames
{
    public const string ShapiroWilk = "shapiro-wilk";
    public const string AndersonDarling = "anderson-darling";
    public const string DagostinoPearson = "dagostino-pearson";
    public const string Levene = "levene";
    public const string BrownForsythe = "brown-forsythe";
    public const string BrownForsytheZerosRemoved = "brown-forsythe-zeros-removed";
    public const string Bartlett = "bartlett";
    public const string FlignerKilleen = "fligner-killeen";
    public const string TukeyNonadditivity = "tukey-nonadditivity";
    public const string LackOfFit = "lack-of-fit";
    public const string Outliers = "outliers";
    public const string DurbinWatson = "durbin-watson";
    public const string Runs = "runs";
    public const string Trend = "trend";
}
