using CellCheck.Core.Calibration;

namespace CellCheck.Core.Planning;

/// <summary>
/// The simulated sensitivity of one test at the design's cell sizes: how often it flags its departure
/// (<see cref="Catches"/>) and how often it flags clean data (<see cref="FalseAlarm"/>); both null with a
/// <see cref="Reason"/> code when the test cannot run at these cell sizes.
/// </summary>
public sealed record SensitivityRow(string Check, string Scope, Departure Departure, RateEstimate? Catches, RateEstimate? FalseAlarm, string? Reason);
