using CellCheck.Core.Calibration;

namespace CellCheck.Core.Planning;

/// <summary>
/// Replicates per cell a single check needs to flag its departure at the target rate in a balanced design of the
/// planned cells: the answer (null with <see cref="Reason"/> when not reached up to the search limit), and the simulated
/// rates at the answer and one replicate below it.
/// </summary>
public sealed record SensitivityNeed(string Check, string Scope, Departure Departure, int? Needed, RateEstimate? AtNeeded, RateEstimate? BelowNeeded, string? Reason);
