using CellCheck.Core.Data;

namespace CellCheck.Core.Remedies;

/// <summary>
/// A response column on a transformed scale, for re-running every check. Rows outside <c>rows</c> (excluded for
/// this response) stay missing. In the Box-Cox family, when the shifted origin y₀ is positive, values are stored
/// relative to t(y₀) and computed from the stored differences d without cancellation: y₀^p·expm1(p·log1p(d/y₀)), or
/// log1p(d/y₀) for the log, so data with many constant leading digits keep their precision.
/// </summary>
public static class ResponseTransform
{
    /// <exception cref="ArgumentOutOfRangeException">A used value is outside the family's domain (Box-Cox needs y + shift &gt; 0).</exception>
    public static ResponseColumn Apply(ResponseColumn column, IReadOnlyCollection<int> rows, TransformChoice choice)
    {
        ArgumentNullException.ThrowIfNull(column);
        ArgumentNullException.ThrowIfNull(rows);
        ArgumentNullException.ThrowIfNull(choice);
        var source = column.Values;
        var values = new double[source.Length];
        Array.Fill(values, double.NaN);
        var y0 = column.Origin + choice.Shift;
        var relative = choice.Family == PowerFamily.BoxCox && y0 > 0;
        var origin = relative ? choice.Apply(column.Origin) : 0.0;
        foreach (var row in rows)
        {
            var d = source[row];
            if (!relative)
            {
                values[row] = choice.Apply(column.Origin + d);
                continue;
            }

            var ratio = d / y0;
            if (!(ratio > -1))
            {
                throw new ArgumentOutOfRangeException(nameof(column), column.Origin + d, "Box-Cox powers need y + shift > 0");
            }

            var log = PreciseMath.Log1P(ratio);
            values[row] = choice.Power == 0 ? log : origin * PreciseMath.ExpM1(choice.Power * log);
        }

        var unit = choice.IsIdentity && choice.Shift == 0 ? column.Unit : null;
        return new ResponseColumn(column.Name, unit, origin, values);
    }
}
