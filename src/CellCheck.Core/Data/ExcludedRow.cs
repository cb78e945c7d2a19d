namespace CellCheck.Core.Data;

/// <summary>A data row left out of a response's checks: its line in the data file, a stable reason code and the reason in words.</summary>
public readonly record struct ExcludedRow(int Line, string Code, string Reason);
