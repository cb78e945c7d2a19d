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
            if (!Usable(v))
            {
                return false;
            }

            target[k] = Math.Log(v);
        }

        return true;
    }

    public ArgumentException Failure()
    {
        var i = Array.FindIndex(y, v => !Usable(v));
        return Refusal(i, y[i]);
    }

    /// <summary>True when log y may be taken: y positive and finite.</summary>
    internal static bool Usable(double y) => y > 0 && double.IsFinite(y);

    /// <summary>The error naming value <paramref name="index"/> (<paramref name="y"/>), the first that is not <see cref="Usable"/>.</summary>
    internal static ArgumentException Refusal(int index, double y) =>
        new($"Box-Cox needs positive finite values; value {index} is {y}", nameof(y));
}
