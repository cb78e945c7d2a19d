namespace CellCheck.IO.TextFiles;

/// <summary>The first fault in a text file: its kind, 1-based line and character column (null for a whole line), and the bytes in words.</summary>
public sealed record TextFault(TextFaultKind Kind, int Line, int? Column, string Detail);
