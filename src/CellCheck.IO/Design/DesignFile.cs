using CellCheck.Core.Statistics;

namespace CellCheck.IO.Design;

/// <summary>A parsed and validated design file. <see cref="DataPath"/> is resolved against the design file's folder.</summary>
public sealed record DesignFile(
    string Path,
    string? Name,
    string DataPath,
    string DataText,
    SourceMark DataMark,
    IReadOnlyList<ColumnSpec> Factors,
    IReadOnlyList<ColumnSpec> Responses,
    ColumnSpec? RunOrder,
    double Alpha,
    AdjustMethod Adjust,
    IReadOnlyList<ColumnSpec> Blocks,
    ModelDeclaration Model)
{
    /// <summary>How the data file is read (delimiter, decimal, missing tokens, sheet, filter).</summary>
    public DataOptions Options { get; init; } = DataOptions.Default;

    /// <summary>The family of the within-cell p-value adjustment.</summary>
    public AdjustAcross AdjustAcross { get; init; } = AdjustAcross.Cells;
}
