namespace CellCheck.Core.Calibration;

/// <summary>
/// How much simulation a report does: draws for the null distributions of the primary statistics (fewer for large
/// designs, where each draw costs more), draws per scenario for the operating characteristics, the seed, and the
/// size above which no simulation is done (the asymptotic p-values are used there, and the operating
/// characteristics are not simulated).
/// </summary>
/// <remarks>
/// With B null draws the Monte Carlo critical value carries its own sampling error: the false-alarm rate of one test,
/// given the simulated null sample, has a standard deviation of about √(α(1 − α)/B), 0.2 points at B = 9999 and
/// 0.5 points at B = 1999 for α = 0.05 (common practice, no source).
/// </remarks>
public sealed record CalibrationSettings(
    int NullDraws = 9999,
    int ScenarioDraws = 400,
    int Seed = 20261201,
    int MonteCarloLimit = 10000,
    int LargeDesign = 1000,
    int LargeDesignNullDraws = 1999)
{
    public static CalibrationSettings Default { get; } = new();

    /// <summary>Null draws for a design with <paramref name="count"/> replicated values.</summary>
    public int NullDrawsFor(int count) => count > LargeDesign ? Math.Min(NullDraws, LargeDesignNullDraws) : NullDraws;
}
