namespace CellCheck.Core.Analysis;

/// <summary>Stable names of the assumptions a verdict judges.</summary>
public static class AssumptionNames
{
    public const string Normality = "normality";
    public const string EqualSpread = "equal-spread";
    public const string Independence = "independence";
}
