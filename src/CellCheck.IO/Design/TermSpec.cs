namespace CellCheck.IO.Design;

/// <summary>One model term as written: the factor names it multiplies ("a*b" is [a, b]) and where it was written.</summary>
public sealed record TermSpec(IReadOnlyList<string> Factors, SourceMark Mark);
