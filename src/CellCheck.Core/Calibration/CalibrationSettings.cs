namespace CellCheck.Core.Calibration;

/// <summary>
/// How much simulation a report does: draws for the null distributions of the primary statistics, draws per
/// scenario for the operating characteristics, the seed, and the size above which no simulation is done (the
/// asymptotic p-values are used there, and the operating characteristics are not simulated).
/// </summary>
public sealed record CalibrationSettings(int NullDraws = 1999, int ScenarioDraws = 400, int Seed = 20261201, int MonteCarloLimit = 10000)
{
    public static CalibrationSettings Default { get; } = new();
}
