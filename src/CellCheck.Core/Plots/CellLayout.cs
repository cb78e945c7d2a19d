using System.Globalization;
using CellCheck.Core.Analysis;

namespace CellCheck.Core.Plots;

/// <summary>
/// Where each cell's panel goes. A factorial grid when the cells fit: rows are the levels of one factor (the first
/// factor, or the one with most levels when the first would leave more than <c>maxColumns</c> columns), columns the
/// combinations of the others in design order, level labels on the margins, empty combinations kept in place. Otherwise
/// (one factor, too many columns or too many combinations) the chosen cells wrap row by row, each panel titled with
/// its levels. Levels keep the order of the data unless every label of a factor is a number; then they are sorted.
/// </summary>
/// <param name="Grid">The grid and its margin labels.</param>
/// <param name="Places">The cell index of each place, row by row; −1 for an empty combination. A wrapped grid lists
/// only the chosen cells, and its last row may be short.</param>
/// <param name="Titled">True when each panel carries its levels as a title (wrapped grid).</param>
internal sealed record CellLayout(PanelGrid Grid, int[] Places, bool Titled)
{
    public static CellLayout For(IReadOnlyList<string> factors, IReadOnlyList<CellResult> cells, int[] shown, int maxPanels, int maxColumns, int wrapColumns)
    {
        var levels = LevelOrder(factors.Count, cells);
        if (factors.Count >= 2 && shown.Length == cells.Count)
        {
            var rowFactor = 0;
            if (Product(levels, skip: 0) > maxColumns)
            {
                rowFactor = Enumerable.Range(0, factors.Count).MaxBy(f => levels[f].Count);
            }

            var columns = Product(levels, rowFactor);
            var rows = levels[rowFactor].Count;
            if (columns <= maxColumns && rows * columns <= maxPanels)
            {
                return Factorial(factors, cells, levels, rowFactor, rows, columns);
            }
        }

        var count = shown.Length;
        var wrap = count <= 4 ? Math.Max(1, count) : Math.Min(wrapColumns, (int)Math.Ceiling(Math.Sqrt(count * 1.5)));
        var gridRows = (count + wrap - 1) / wrap;
        return new CellLayout(new PanelGrid(Math.Max(1, gridRows), wrap), shown, true);
    }

    private static CellLayout Factorial(IReadOnlyList<string> factors, IReadOnlyList<CellResult> cells, List<string>[] levels, int rowFactor, int rows, int columns)
    {
        var columnFactors = Enumerable.Range(0, factors.Count).Where(f => f != rowFactor).ToArray();
        var places = new int[rows * columns];
        Array.Fill(places, -1);
        for (var c = 0; c < cells.Count; c++)
        {
            var r = levels[rowFactor].IndexOf(cells[c].Levels[rowFactor]);
            var col = 0;
            foreach (var f in columnFactors)
            {
                col = (col * levels[f].Count) + levels[f].IndexOf(cells[c].Levels[f]);
            }

            places[(r * columns) + col] = c;
        }

        var headers = new List<ColumnHeader>();
        var repeats = 1;
        for (var j = 0; j < columnFactors.Length; j++)
        {
            var f = columnFactors[j];
            var span = 1;
            for (var k = j + 1; k < columnFactors.Length; k++)
            {
                span *= levels[columnFactors[k]].Count;
            }

            var spans = new List<HeaderSpan>();
            for (var rep = 0; rep < repeats; rep++)
            {
                spans.AddRange(levels[f].Select(l => new HeaderSpan(l, span)));
            }

            headers.Add(new ColumnHeader(factors[f], spans));
            repeats *= levels[f].Count;
        }

        var grid = new PanelGrid(rows, columns) { RowTitle = factors[rowFactor], RowLabels = levels[rowFactor], ColumnHeaders = headers };
        return new CellLayout(grid, places, false);
    }

    private static int Product(List<string>[] levels, int skip)
    {
        var p = 1;
        for (var f = 0; f < levels.Length; f++)
        {
            p *= f == skip ? 1 : levels[f].Count;
        }

        return p;
    }

    /// <summary>Each factor's levels in order of first appearance among the cells, or numerically when all are numbers.</summary>
    public static List<string>[] LevelOrder(int factorCount, IReadOnlyList<CellResult> cells)
    {
        var levels = new List<string>[factorCount];
        for (var f = 0; f < factorCount; f++)
        {
            var seen = new List<string>();
            foreach (var cell in cells)
            {
                if (!seen.Contains(cell.Levels[f]))
                {
                    seen.Add(cell.Levels[f]);
                }
            }

            var numbers = seen.Select(l => double.TryParse(l, NumberStyles.Float, CultureInfo.InvariantCulture, out var v) ? v : double.NaN).ToArray();
            levels[f] = numbers.All(double.IsFinite) ? [.. seen.Zip(numbers).OrderBy(p => p.Second).Select(p => p.First)] : seen;
        }

        return levels;
    }
}
