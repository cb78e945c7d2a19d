namespace CellCheck.Core.Analysis;

/// <summary>
/// Within-cell p-values adjusted over the cells of all responses together (<c>adjust_across: cells-and-responses</c>):
/// for each response and check, the adjusted p of each cell (null where the cell's test did not run).
/// </summary>
public sealed class JointCellAdjustment
{
    private readonly Dictionary<(string Response, string Check), double?[]> _adjusted = [];

    public void Set(string response, string check, double?[] adjusted) => _adjusted[(response, check)] = adjusted;

    public double?[]? Get(string response, string check) => _adjusted.GetValueOrDefault((response, check));
}
