namespace CellCheck.Core.Analysis;

/// <summary>A row named by the outlier screen: its data-file line, externally studentized residual and Bonferroni-adjusted p.</summary>
public sealed record OutlierRow(int Line, double Studentized, double PAdjusted);
