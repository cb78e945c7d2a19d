namespace CellCheck.Core.Tests.Scale;

/// <summary>A statistic computed by the reference side, its degrees of freedom (NaN where none) and its p-value.</summary>
internal readonly record struct ReferenceOutcome(double Statistic, double P, double Df1 = double.NaN, double Df2 = double.NaN);
