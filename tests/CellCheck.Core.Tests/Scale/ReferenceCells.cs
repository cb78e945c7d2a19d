namespace CellCheck.Core.Tests.Scale;

/// <summary>
/// The cell-means model computed the plain way, with no production code: rows grouped into cells by their level
/// combination (a dictionary, in order of first appearance), each cell mean by compensated summation refined by a
/// second pass, residual = value − cell mean, pooled s² = Σ e² / (N − k), and the internally studentized residual
/// e / (s √(1 − 1/n_cell)) (NaN in a cell of one row, whose leverage is 1); and the residuals in run order.
/// </summary>
internal sealed class ReferenceCells
{
    private readonly Dictionary<string, int> _index;

    private ReferenceCells(List<double[]> groups, List<int[]> rows, List<string> keys, double[] means, double[] residual, double[] studentized,
        double residualSd, int residualDf, double[] runOrder)
    {
        var ordered = rows.Where(r => r.Length >= 2).SelectMany(r => r).OrderBy(row => runOrder[row]).ThenBy(row => row).ToArray();
        ResidualsInRunOrder = ordered.Select(row => residual[row]).ToArray();
        PositionsInRunOrder = ordered.Select(row => runOrder[row]).ToArray();
        Groups = groups;
        Rows = rows;
        Keys = keys;
        _index = keys.Select((key, i) => (key, i)).ToDictionary(p => p.key, p => p.i, StringComparer.Ordinal);
        Means = means;
        Residual = residual;
        Studentized = studentized;
        ResidualSd = residualSd;
        ResidualDf = residualDf;
    }

    /// <summary>The values of each cell, in row order.</summary>
    public List<double[]> Groups { get; }

    /// <summary>The rows of each cell.</summary>
    public List<int[]> Rows { get; }

    /// <summary>The level labels of each cell joined by '|'.</summary>
    public List<string> Keys { get; }

    /// <summary>The mean of each cell (relative to the origin).</summary>
    public double[] Means { get; }

    /// <summary>Value − cell mean, per row.</summary>
    public double[] Residual { get; }

    /// <summary>Internally studentized residual per row; NaN in a cell of one row.</summary>
    public double[] Studentized { get; }

    public double ResidualSd { get; }

    public int ResidualDf { get; }

    /// <summary>The residuals of the rows whose cell has two or more rows (a singleton's residual is zero by construction),
    /// sorted by run position, rows sharing a position kept in file order.</summary>
    public double[] ResidualsInRunOrder { get; }

    /// <summary>The run positions of <see cref="ResidualsInRunOrder"/>.</summary>
    public double[] PositionsInRunOrder { get; }

    /// <summary>The index of the cell with these level labels joined by '|'.</summary>
    public int CellOf(string key) => _index[key];

    /// <summary>The cells with at least two values (those that take part in the spread tests).</summary>
    public List<double[]> Replicated => Groups.Where(g => g.Length >= 2).ToList();

    public static ReferenceCells From(ScaleDesign design)
    {
        var n = design.Values.Length;
        var index = new Dictionary<long, int>();
        var members = new List<List<int>>();
        var keys = new List<string>();
        for (var row = 0; row < n; row++)
        {
            long key = 0;
            for (var f = 0; f < design.Codes.Length; f++)
            {
                key = (key * design.LevelCounts[f]) + design.Codes[f][row];
            }

            if (!index.TryGetValue(key, out var cell))
            {
                cell = members.Count;
                index.Add(key, cell);
                members.Add([]);
                keys.Add(string.Join('|', Enumerable.Range(0, design.Codes.Length).Select(f => design.Labels[f][design.Codes[f][row]])));
            }

            members[cell].Add(row);
        }

        var rows = members.Select(m => m.ToArray()).ToList();
        var groups = rows.Select(r => r.Select(row => design.Values[row]).ToArray()).ToList();
        var means = groups.Select(CarefulMean).ToArray();
        var residual = new double[n];
        var squares = default(CompensatedSum);
        for (var c = 0; c < rows.Count; c++)
        {
            foreach (var row in rows[c])
            {
                residual[row] = design.Values[row] - means[c];
                squares.Add(residual[row] * residual[row]);
            }
        }

        var df = n - rows.Count;
        var s = Math.Sqrt(squares.Value / df);
        var studentized = new double[n];
        for (var c = 0; c < rows.Count; c++)
        {
            foreach (var row in rows[c])
            {
                studentized[row] = rows[c].Length == 1 ? double.NaN : residual[row] / (s * Math.Sqrt(1.0 - (1.0 / rows[c].Length)));
            }
        }

        return new ReferenceCells(groups, rows, keys, means, residual, studentized, s, df, design.RunOrder);
    }

    /// <summary>Mean by compensated summation, then corrected by the compensated mean of the deviations (two passes).</summary>
    public static double CarefulMean(double[] x)
    {
        var first = CompensatedSum.Of(x) / x.Length;
        var deviations = default(CompensatedSum);
        foreach (var v in x)
        {
            deviations.Add(v - first);
        }

        return first + (deviations.Value / x.Length);
    }
}
