namespace CellCheck.IO.Design;

/// <summary>One condition of a <see cref="WhereClause"/>: the column and the values it may take.</summary>
public sealed record WhereCondition(string Column, IReadOnlyList<string> Values, SourceMark Mark);
