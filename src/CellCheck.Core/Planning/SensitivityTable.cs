using CellCheck.Core.Statistics;

namespace CellCheck.Core.Planning;

/// <summary>
/// What the single checks could have seen at this design's cell sizes and alpha (after the within-cell adjustment):
/// one row per test, from <see cref="Draws"/> seeded simulated data sets per scenario. <see cref="Note"/> says why
/// there are no rows when the design was not simulated.
/// </summary>
public sealed record SensitivityTable(double Alpha, AdjustMethod Adjust, int Draws, int Seed, IReadOnlyList<SensitivityRow> Rows, string? Note);
