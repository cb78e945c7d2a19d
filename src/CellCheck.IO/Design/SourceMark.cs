namespace CellCheck.IO.Design;

/// <summary>A 1-based line and column in a design file.</summary>
public readonly record struct SourceMark(int Line, int Column);
