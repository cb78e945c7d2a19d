using CellCheck.Core.Data;
using CellCheck.Core.Remedies;
using CellCheck.Core.Tests.Statistics;

namespace CellCheck.Core.Tests.Remedies;

/// <summary>Transformed response columns keep the precision of values stored relative to a large origin.</summary>
public sealed class ResponseTransformTests
{
    private static readonly ResponseColumn Column = new("y", "g", 1e12, [0, 0.4, double.NaN, 0.8]);

    [Fact]
    public void The_log_of_values_with_many_constant_digits_keeps_their_differences()
    {
        var t = ResponseTransform.Apply(Column, [0, 1, 3], new TransformChoice(PowerFamily.BoxCox, 0));
        Assert.Equal(Math.Log(1e12), t.Origin);
        // log((y0 + d)/y0) = d/y0 - (d/y0)^2/2 + ...: for d/y0 = 4e-13 the first term is exact to 1e-13 relative;
        // a direct log(1e12 + 0.4) - log(1e12) would be wrong in the second digit
        Close.Relative(4e-13, t.Values[1], 1e-12);
        Close.Relative(8e-13, t.Values[3], 1e-12);
        Assert.True(double.IsNaN(t.Values[2]));
        Assert.Null(t.Unit);
    }

    [Fact]
    public void The_reciprocal_of_values_with_many_constant_digits_keeps_their_differences()
    {
        var t = ResponseTransform.Apply(Column, [0, 1, 3], new TransformChoice(PowerFamily.BoxCox, -1));
        Assert.Equal(1e-12, t.Origin);
        // 1/(y0 + d) - 1/y0 = -d/y0^2 (1 - d/y0 + ...) = -4e-25 to 1e-12 relative
        Close.Relative(-4e-25, t.Values[1], 1e-12);
        Assert.Equal(0, t.Values[0]);
    }

    [Fact]
    public void Rows_left_out_stay_missing_and_non_positive_values_are_refused()
    {
        var t = ResponseTransform.Apply(Column, [1], new TransformChoice(PowerFamily.BoxCox, 0.5));
        Assert.True(double.IsNaN(t.Values[0]));
        var negative = new ResponseColumn("y", null, -1, [0, 2]);
        Assert.Throws<ArgumentOutOfRangeException>(() => ResponseTransform.Apply(negative, [0, 1], new TransformChoice(PowerFamily.BoxCox, 0)));
        var shifted = ResponseTransform.Apply(negative, [0, 1], new TransformChoice(PowerFamily.BoxCox, 0, 2));
        // log(-1 + 2) = 0 at the origin; log(1 + 2) - log(1) for the second row
        Assert.Equal(0, shifted.Origin);
        Close.Relative(Math.Log(3), shifted.Values[1], 1e-15);
        var yj = ResponseTransform.Apply(negative, [0, 1], new TransformChoice(PowerFamily.YeoJohnson, 1));
        Assert.Equal([-1.0, 1.0], yj.Values);
    }
}
