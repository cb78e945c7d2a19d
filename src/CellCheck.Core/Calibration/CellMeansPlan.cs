using CellCheck.Core.Statistics;

namespace CellCheck.Core.Calibration;

/// <summary>The null plan of the cell-means model: only the replicated cells matter, in ascending size order.</summary>
public sealed class CellMeansPlan : INullPlan
{
    public CellMeansPlan(DesignShape shape)
    {
        ArgumentNullException.ThrowIfNull(shape);
        Shape = shape;
        CellStarts = new int[shape.Sizes.Length + 1];
        for (var c = 0; c < shape.Sizes.Length; c++)
        {
            CellStarts[c + 1] = CellStarts[c] + shape.Sizes[c];
        }

        Key = "cell-means:" + Shape.Key;
    }

    private CellMeansPlan(int[] cellStarts)
    {
        CellStarts = cellStarts;
        Shape = new DesignShape(Enumerable.Range(0, cellStarts.Length - 1).Select(c => cellStarts[c + 1] - cellStarts[c]));
        Key = "cell-means-layout:" + string.Join(",", cellStarts);
    }

    /// <summary>A plan over an actual layout of cells in its own order, singletons included (their studentized residuals are NaN).</summary>
    public static CellMeansPlan ForLayout(int[] cellStarts) => new(cellStarts);

    public string Key { get; }

    public DesignShape Shape { get; }

    public int Rows => CellStarts[^1];

    public int UsableResiduals => Shape.Count;

    public int[] CellStarts { get; }

    public void Residualize(ReadOnlySpan<double> y, Span<double> residuals, Span<double> studentized)
    {
        var ss = 0.0;
        for (var c = 0; c + 1 < CellStarts.Length; c++)
        {
            var cell = y[CellStarts[c]..CellStarts[c + 1]];
            var mean = Descriptive.Mean(cell);
            for (var j = 0; j < cell.Length; j++)
            {
                var e = cell[j] - mean;
                residuals[CellStarts[c] + j] = e;
                ss += e * e;
            }
        }

        var s = Math.Sqrt(ss / (Rows - (CellStarts.Length - 1)));
        for (var c = 0; c + 1 < CellStarts.Length; c++)
        {
            var scale = s * Math.Sqrt(1.0 - (1.0 / (CellStarts[c + 1] - CellStarts[c])));
            for (var i = CellStarts[c]; i < CellStarts[c + 1]; i++)
            {
                studentized[i] = residuals[i] / scale;
            }
        }
    }
}
