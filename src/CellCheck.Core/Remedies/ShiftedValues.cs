namespace CellCheck.Core.Remedies;

/// <summary>
/// The response on the scale a transformation sees, y_i = Offset + Values[i] (offset = the column's origin plus the
/// shift), read on demand instead of copied: the same doubles as the copy, without a second array of the data's length.
/// </summary>
internal readonly struct ShiftedValues(double[] values, double offset) : IIndexedValues
{
    public int Length => values.Length;

    public double this[int i] => offset + values[i];

    /// <summary>The values as an array, for the fits that take one.</summary>
    public double[] ToArray()
    {
        var y = new double[values.Length];
        for (var i = 0; i < y.Length; i++)
        {
            y[i] = this[i];
        }

        return y;
    }
}
