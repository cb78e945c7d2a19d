using CellCheck.Core.Statistics;

namespace CellCheck.Core.Analysis;

/// <summary>Significance level and the multiplicity adjustment applied to within-cell p-values across the cells of a response.</summary>
public sealed record AnalysisOptions(double Alpha = 0.05, AdjustMethod Adjust = AdjustMethod.Holm);
