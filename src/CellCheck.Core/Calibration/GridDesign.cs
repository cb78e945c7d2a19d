namespace CellCheck.Core.Calibration;

/// <summary>One design of the calibration grid: a label and its cell sizes.</summary>
public sealed record GridDesign(string Label, int Cells, double MeanSize, bool Balanced, DesignShape Shape)
{
    /// <summary>A design of <paramref name="cells"/> cells around <paramref name="n"/> values each; unbalanced designs
    /// cycle the sizes n − 1, n, n + 1 (at least 2), so the mean size stays about n.</summary>
    public static GridDesign Create(int cells, int n, bool balanced)
    {
        var sizes = Enumerable.Range(0, cells).Select(i => balanced ? n : Math.Max(2, n + ((i % 3) - 1))).ToArray();
        var label = cells.ToString(System.Globalization.CultureInfo.InvariantCulture) + " cells, n " + (balanced
            ? n.ToString(System.Globalization.CultureInfo.InvariantCulture)
            : sizes.Min().ToString(System.Globalization.CultureInfo.InvariantCulture) + "-" + sizes.Max().ToString(System.Globalization.CultureInfo.InvariantCulture));
        return new GridDesign(label, cells, sizes.Average(), balanced, new DesignShape(sizes));
    }
}
