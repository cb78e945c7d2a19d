namespace CellCheck.Core.Models;

/// <summary>Effects of an unreplicated two-level factorial with their half-normal quantiles, Lenth's PSE, ME and SME.</summary>
public sealed record LenthResult(double[] Effects, double[] HalfNormalQuantiles, double PseudoStandardError, double MarginOfError, double SimultaneousMargin);
