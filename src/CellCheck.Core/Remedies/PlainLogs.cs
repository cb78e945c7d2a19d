namespace CellCheck.Core.Remedies;

/// <summary>log y in the order of <paramref name="y"/> (the cells of the cell-means model, grouped).</summary>
internal sealed class PlainLogs(double[] y) : ILogSource
{
    public int Count => y.Length;

    public bool TryFill(int from, Span<double> target)
    {
        for (var k = 0; k < target.Length; k++)
        {
            var v = y[from + k];
            if (!(v > 0) || !double.IsFinite(v))
            {
                return false;
            }

            target[k] = Math.Log(v);
        }

        return true;
    }

    public ArgumentException Failure()
    {
        var i = Array.FindIndex(y, v => !(v > 0) || !double.IsFinite(v));
        return new ArgumentException($"Box-Cox needs positive finite values; value {i} is {y[i]}", nameof(y));
    }
}
