namespace CellCheck.Core.Models;

/// <summary>
/// A model's design matrix for the rows of one response (in the partition's grouped order): its columns' names,
/// the term each column belongs to (−1 for the intercept), and the term names (factor terms, then blocks).
/// </summary>
public sealed record DesignMatrix(double[,] X, IReadOnlyList<string> Columns, IReadOnlyList<int> ColumnTerm, IReadOnlyList<string> Terms)
{
    public int Rows => X.GetLength(0);

    public int ColumnCount => X.GetLength(1);
}
