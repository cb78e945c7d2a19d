namespace CellCheck.Core.Data;

/// <summary>One integer per data row, read by row (level codes, data-file lines), held in whatever form suits it.</summary>
internal interface IRowValues
{
    int Length { get; }

    int this[int row] { get; }
}
