using CellCheck.Core.Calibration;

namespace CellCheck.Core.Planning;

/// <summary>One single test whose sensitivity is simulated: its report name, where it looks (<see cref="SensitivityScopes"/>)
/// and the departure it is asked to see.</summary>
public sealed record SensitivityCheck(string Check, string Scope, Departure Departure);
