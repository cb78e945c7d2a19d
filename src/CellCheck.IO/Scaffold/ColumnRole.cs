namespace CellCheck.IO.Scaffold;

/// <summary>The role a scaffold proposes for a column.</summary>
public enum ColumnRole
{
    Factor,
    Response,
    RunOrder,
    Block,
    Ignore,
}
