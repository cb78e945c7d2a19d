namespace CellCheck.IO.Scaffold;

/// <summary>What a data column looks like: how many rows, distinct values and missing values, the share of values
/// that are numbers, whether the numbers are distinct increasing positions, and the role proposed for it.</summary>
public sealed record ColumnProfile(string Name, int Rows, int Distinct, int Missing, double NumericShare, bool LooksLikeSequence, bool LooksLikeTime, ColumnRole Role);
